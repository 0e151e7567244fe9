import { verdictByKey } from '@shared/rules/index';
import { shareBands } from '@shared/schemas/share-bands';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { seasonParam } from '@/lib/season';
import { formatDate, formatNumber, todayIso, useUnitSystem } from '@/lib/units';
import { warningLabel } from '@/lib/warning-labels';
import { useFieldSheet, type SheetFilters } from '../api/get-field-sheet';
import { FieldSheetCautions } from './field-sheet-cautions';
import { FieldSheetTable } from './field-sheet-table';
import { usePlanSearchParams } from './plan-search-params';

/** The filters a sheet was asked with, in words, so a printed part says it is a part. */
function filterWords(f: SheetFilters): string | null {
  const parts = [
    f.q && `tags containing “${f.q}”`,
    f.verdict && `verdict ${verdictByKey[f.verdict].label}`,
    f.warning && `warning ${warningLabel(f.warning)}`,
    f.share && `clear wood ${shareBands.find((b) => b.key === f.share)?.label}`,
  ].filter(Boolean);
  return parts.length ? parts.join(', ') : null;
}

/**
 * The field sheet for the whole stand, or the part the plan's filters choose: every tree to tap
 * in walking order, loaded page after page with the count shown, then printed.
 */
export function FieldSheet({ sugarbushId }: { sugarbushId: number }) {
  const { filters: all } = usePlanSearchParams();
  const filters: SheetFilters = {
    season: all.season,
    q: all.q,
    verdict: all.verdict,
    warning: all.warning,
    share: all.share,
  };
  const { system } = useUnitSystem();
  const sheet = useFieldSheet(sugarbushId, filters);
  const back = paths.plan.href(sugarbushId, { ...filters, season: seasonParam(filters.season) });
  const part = filterWords(filters);

  if (sheet.query.isError)
    return (
      <ErrorState
        title="We couldn't load the field sheet."
        error={sheet.query.error}
        onRetry={() => void (sheet.head ? sheet.query.fetchNextPage() : sheet.query.refetch())}
      />
    );
  const head = sheet.head;
  return (
    <article aria-labelledby="sheet-title" className="field-sheet">
      <header className="mb-3 border-b border-ink pb-2">
        <h1 id="sheet-title" className="text-xl font-bold">
          Field sheet, season {filters.season}
        </h1>
        {head && (
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4 text-sm">
            <dt className="font-bold">Stand</dt>
            <dd>{head.standName}</dd>
            <dt className="font-bold">Season</dt>
            <dd>{head.season}</dd>
            <dt className="font-bold">Guideline</dt>
            <dd>{head.profile.label}</dd>
            <dt className="font-bold">Printed</dt>
            <dd>{formatDate(todayIso())}</dd>
            <dt className="font-bold">Plan</dt>
            <dd>
              {head.issued
                ? `The issued plan, version ${head.issued.version}, issued ${formatDate(head.issued.issuedAt)} by ${head.issued.issuedBy || 'a former member'}.`
                : 'Today’s advice: no plan has been issued for this season.'}
            </dd>
            <dt className="font-bold">Trees</dt>
            <dd>
              {formatNumber(head.total)} to tap, {formatNumber(head.taps)} taps
              {part ? ` — only ${part}` : ' — the whole stand'}, in walking order.
            </dd>
          </dl>
        )}
        <div className="mt-3 flex flex-wrap items-center gap-3 print:hidden">
          <Button variant="primary" disabled={!sheet.complete} onClick={() => window.print()}>
            Print
          </Button>
          <TextLink to={back}>Back to the plan</TextLink>
        </div>
      </header>
      {!sheet.complete && (
        <div className="mb-3 print:hidden" aria-live="polite">
          <p>
            Loading the sheet
            {sheet.total > 0
              ? `: ${formatNumber(sheet.loaded)} of ${formatNumber(sheet.total)} trees`
              : '…'}
          </p>
          <progress
            className="h-2 w-full max-w-md accent-sap"
            value={sheet.loaded}
            max={Math.max(sheet.total, 1)}
            aria-label="Sheet lines loaded"
          />
        </div>
      )}
      {sheet.complete &&
        (sheet.lines.length === 0 ? (
          <p className="my-4">
            No tree to tap{part ? ' among the trees chosen' : ' this season'}: nothing to print.
          </p>
        ) : (
          <FieldSheetTable lines={sheet.lines} system={system} />
        ))}
      <div className="mt-6 break-inside-avoid">
        <FieldSheetCautions />
      </div>
    </article>
  );
}
