import { useId } from 'react';
import type { GuidelinePreview, TreeTapChange } from '@shared/schemas/guideline-preview';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { VerdictBadge } from '@/components/verdict-badge';
import { paths } from '@/config/paths';
import { formatDbh, formatNumber, type LengthUnit } from '@/lib/units';

const tapsText = (n: number) => `${formatNumber(n)} ${n === 1 ? 'tap' : 'taps'}`;

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-bark">{label}</dt>
      <dd className="text-lg font-bold tabular-nums">{value}</dd>
    </div>
  );
}

/**
 * What the chosen guideline would do to this season's plan, as the API computed it: the
 * stand's taps before and after, the trees that change, and those trees one by one.
 */
export function GuidelinePreviewPanel({
  preview,
  unit,
  saving,
  error,
  onSave,
  onCancel,
}: {
  preview: GuidelinePreview;
  unit: LengthUnit;
  saving: boolean;
  error?: string | null;
  onSave: () => void;
  onCancel: () => void;
}) {
  const headingId = useId();
  const { from, to, season } = preview;
  const columns: Column<TreeTapChange>[] = [
    {
      key: 'tag',
      header: 'Tag',
      cell: (c) => (
        <Link to={paths.tree.href(c.treeId, { season })} className="underline underline-offset-4">
          {c.tag}
        </Link>
      ),
    },
    { key: 'dbh', header: 'DBH', align: 'right', cell: (c) => formatDbh(c.dbhCm, unit) },
    {
      key: 'taps',
      header: 'Taps',
      align: 'right',
      cell: (c) => `${formatNumber(c.fromTaps)} → ${formatNumber(c.toTaps)}`,
    },
    {
      key: 'verdict',
      header: 'Advice',
      cell: (c) => (
        <span className="inline-flex flex-wrap items-center gap-2">
          <VerdictBadge verdict={c.fromVerdict} />
          <span aria-label="becomes">→</span>
          <VerdictBadge verdict={c.toVerdict} />
        </span>
      ),
    },
  ];

  return (
    <section aria-labelledby={headingId} className="rounded border border-sap px-4 py-4">
      <h3 id={headingId} className="text-lg font-bold">
        What this changes in {season}
      </h3>
      <p className="mt-1 max-w-prose">
        From {from.label} to {to.label}: {tapsText(from.taps)} on {formatNumber(from.tappedTrees)}{' '}
        trees become {tapsText(to.taps)} on {formatNumber(to.tappedTrees)} trees.
      </p>
      <dl
        aria-label="The change in figures"
        className="mt-3 grid grid-cols-2 gap-x-4 gap-y-3 sm:grid-cols-3 lg:grid-cols-6"
      >
        <Figure label="Taps now" value={formatNumber(from.taps)} />
        <Figure label="Taps after" value={formatNumber(to.taps)} />
        <Figure label="Trees whose taps change" value={formatNumber(preview.treesChanged)} />
        <Figure label="Taps added" value={formatNumber(preview.tapsAdded)} />
        <Figure label="Taps removed" value={formatNumber(preview.tapsRemoved)} />
        <Figure label="Trees become too small" value={formatNumber(preview.treesBecomeTooSmall)} />
      </dl>

      <div className="mt-4">
        {preview.changesTotal === 0 ? (
          <p className="text-bark">No tree&apos;s tap count changes this season.</p>
        ) : (
          <>
            <h4 className="mb-1 font-bold">Trees that change</h4>
            {preview.changes.length < preview.changesTotal && (
              <p className="mb-2 text-sm text-bark">
                The {formatNumber(preview.changes.length)} biggest changes of{' '}
                {formatNumber(preview.changesTotal)}.
              </p>
            )}
            <div className="max-h-96 overflow-y-auto">
              <DataTable
                label="Trees that change"
                columns={columns}
                rows={preview.changes}
                rowKey={(c) => c.treeId}
              />
            </div>
          </>
        )}
      </div>

      {error && (
        <p role="alert" className="mt-3 text-alert">
          {error}
        </p>
      )}
      <div className="mt-4 flex flex-wrap gap-3">
        <Button
          variant="primary"
          block
          onClick={onSave}
          disabled={saving}
          aria-busy={saving || undefined}
        >
          Save this guideline
        </Button>
        <Button block onClick={onCancel} disabled={saving}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
