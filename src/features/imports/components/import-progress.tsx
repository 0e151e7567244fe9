import { importPhaseLabels, type ImportPhase, type ImportProgress } from '@shared/schemas/imports';
import { formatNumber } from '@/lib/units';

export interface UploadState {
  sent: number;
  total: number;
}

interface Shown {
  step: number;
  of: number;
  label: string;
  /** 0–100, or null while the step cannot be counted. */
  percent: number | null;
  detail: string;
}

const kB = (bytes: number) => `${formatNumber(Math.max(1, Math.round(bytes / 1000)))} kB`;
const pct = (done: number, total: number) =>
  total > 0 ? Math.min(100, Math.floor((done / total) * 100)) : null;

/** What the bar says: the browser's upload until the server has the file, then its steps. */
export function progressShown(
  dryRun: boolean,
  upload: UploadState | null,
  server: ImportProgress | undefined,
): Shown {
  const steps: readonly ImportPhase[] = dryRun
    ? ['receiving', 'reading', 'checking']
    : ['receiving', 'reading', 'checking', 'writing', 'advising'];
  const of = steps.length;
  const at = server && server.phase !== 'receiving' ? server : null;
  if (at?.phase === 'done')
    return {
      step: of,
      of,
      label: importPhaseLabels.done,
      percent: 100,
      detail: 'answer on its way',
    };
  if (!at || at.phase === 'failed') {
    const sent = upload?.sent ?? 0;
    const total = upload?.total ?? 0;
    if (at || (total > 0 && sent >= total))
      return {
        step: Math.min(2, of),
        of,
        label: importPhaseLabels.reading,
        percent: null,
        detail: 'the file is on the server',
      };
    return {
      step: 1,
      of,
      label: importPhaseLabels.receiving,
      percent: pct(sent, total),
      detail: total > 0 ? `${kB(sent)} of ${kB(total)}` : 'starting',
    };
  }
  const step = Math.max(1, steps.indexOf(at.phase) + 1);
  const counted = at.phase === 'checking' || at.phase === 'writing';
  const percent = pct(at.done, at.total);
  return {
    step,
    of,
    label: importPhaseLabels[at.phase],
    percent,
    detail: counted
      ? `${formatNumber(at.done)} of ${formatNumber(at.total)} rows`
      : percent === null
        ? 'under way'
        : `${percent} %`,
  };
}

/**
 * A running check or import: which step of how many, and how far that step has come — a real
 * progress bar (its value and text for screen readers), the step's name announced as it changes.
 */
export function ImportProgressBar({
  dryRun,
  upload,
  server,
}: {
  dryRun: boolean;
  upload: UploadState | null;
  server: ImportProgress | undefined;
}) {
  const shown = progressShown(dryRun, upload, server);
  const text = `Step ${shown.step} of ${shown.of}: ${shown.label}, ${shown.detail}`;
  return (
    <div className="flex max-w-xl flex-col gap-2">
      <p role="status" className="font-bold">
        {dryRun ? 'Checking the file' : 'Importing'} — step {shown.step} of {shown.of}:{' '}
        {shown.label.toLowerCase()}
      </p>
      <div
        role="progressbar"
        aria-label={dryRun ? 'Check of the file' : 'Import of the file'}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={shown.percent ?? undefined}
        aria-valuetext={text}
        className="h-3 w-full overflow-hidden rounded-full border border-rule bg-frost"
      >
        <div
          className={`h-full bg-sap transition-[width] ${shown.percent === null ? 'w-1/3 animate-pulse' : ''}`}
          style={shown.percent === null ? undefined : { width: `${shown.percent}%` }}
        />
      </div>
      <p className="text-sm tabular-nums text-bark">{shown.detail}</p>
    </div>
  );
}
