/**
 * Formatting the benchmark's figures: markdown tables printed to the console and written to
 * docs/benchmarks.md, each figure beside its floor and its target.
 */

export const fmt = (n: number, digits?: number) => {
  if (!Number.isFinite(n)) return 'n/a';
  const d = digits ?? (Math.abs(n) < 10 ? 1 : 0);
  return n.toLocaleString('en-US', { minimumFractionDigits: d, maximumFractionDigits: d });
};
export const ms = (n: number) => `${fmt(n)} ms`;
export const ratio = (a: number, b: number) =>
  b > 0 && Number.isFinite(a) ? `${fmt(a / b, a / b < 10 ? 2 : 0)}×` : 'n/a';
export const kb = (bytes: number) => `${fmt(bytes / 1000, 1)} kB`;

export interface Verdict {
  what: string;
  met: boolean;
  text: string;
}

/**
 * "met (12 ms ≤ 50 ms)" or "missed by 30 ms (80 ms, limit 50 ms)"; for ratios
 * "missed: 7.5× (limit 3×)".
 */
export function under(
  what: string,
  value: number,
  limit: number,
  unit: (n: number) => string = ms,
  kind: 'amount' | 'ratio' = 'amount',
): Verdict {
  const met = Number.isFinite(value) && value <= limit;
  let text: string;
  if (!Number.isFinite(value)) text = 'missed (no figure)';
  else if (met) text = `met (${unit(value)} ≤ ${unit(limit)})`;
  else if (kind === 'ratio') text = `missed: ${unit(value)} (limit ${unit(limit)})`;
  else text = `missed by ${unit(value - limit)} (${unit(value)}, limit ${unit(limit)})`;
  return { what, met, text };
}

export function table(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const align = header.map((_, i) =>
    rows.every((r) => /^[\d.,\s×%–-]*(ms|s|kB|MiB|req\/s)?[\s×]*$|^n\/a$/.test(r[i] ?? ''))
      ? 'r'
      : 'l',
  );
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const cell = (s: string, i: number) =>
    align[i] === 'r' ? s.padStart(widths[i]) : s.padEnd(widths[i]);
  const line = (cells: readonly string[]) => `| ${cells.map(cell).join(' | ')} |`;
  const rule = `| ${widths.map((w, i) => (align[i] === 'r' ? `${'-'.repeat(w - 1)}:` : '-'.repeat(w))).join(' | ')} |`;
  return [line(header), rule, ...rows.map(line)].join('\n');
}

/** The report as it grows: sections of prose and tables. */
export class Report {
  private parts: string[] = [];
  readonly verdicts: Verdict[] = [];

  heading(text: string) {
    this.parts.push(`## ${text}`);
    console.log(`\n== ${text}`);
  }
  para(text: string) {
    this.parts.push(text.trim());
    console.log(text.trim());
  }
  table(header: readonly string[], rows: readonly (readonly string[])[]) {
    const t = table(header, rows);
    this.parts.push(t);
    console.log(t);
  }
  verdict(v: Verdict) {
    this.verdicts.push(v);
    return v.text;
  }
  markdown(title: string, preface: string) {
    return `# ${title}\n\n${preface}\n\n${this.parts.join('\n\n')}\n`;
  }
}
