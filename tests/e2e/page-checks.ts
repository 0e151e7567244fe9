import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const axeSource: string = (require('axe-core') as { source: string }).source;

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/** axe-core run in the page: the violations of impact serious or critical. */
export async function seriousAxeViolations(page: Page): Promise<AxeViolation[]> {
  const loaded = await page.evaluate(() => 'axe' in window);
  if (!loaded) await page.addScriptTag({ content: axeSource });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document) => Promise<unknown> } }).axe;
    const result = (await axe.run(document)) as {
      violations: {
        id: string;
        impact: string | null;
        help: string;
        nodes: { target: unknown[] }[];
      }[];
    };
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.map((n) => n.target.map(String).join(' ')),
    }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

/** How far the page is wider than the viewport, in CSS pixels (0 when nothing overflows). */
export const horizontalOverflow = (page: Page): Promise<number> =>
  page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

/** The visible buttons (within `scope`) shorter than `minPx`, by their text. */
export async function shortButtons(page: Page, scope = 'body', minPx = 44): Promise<string[]> {
  return page.evaluate(
    ({ scope, minPx }) =>
      [...document.querySelectorAll(`${scope} button`)]
        .filter((b) => {
          const r = b.getBoundingClientRect();
          return r.width > 0 && r.height > 0 && r.height < minPx - 0.5;
        })
        .map(
          (b) =>
            `${(b.textContent ?? '').trim() || b.getAttribute('aria-label')} (${Math.round(b.getBoundingClientRect().height)} px)`,
        ),
    { scope, minPx },
  );
}
