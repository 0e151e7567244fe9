import { useState } from 'react';
import { formatTemperature } from '@shared/rules/index';
import type { SapEntry, SapListQuery } from '@shared/schemas/sap';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { SelectField } from '@/components/ui/select-field';
import { TableSkeleton } from '@/components/ui/skeleton';
import { collectionLabels } from '@/lib/collection-labels';
import { formatDate, formatNumber } from '@/lib/units';
import { useSapEntries } from '../api/get-sap-entries';
import { entryCautions } from '../lib/season-days';
import { formatBrix, formatVolume, type SeasonUnits } from '../lib/season-units';
import { SapCautions } from './sap-cautions';
import { SapForm } from './sap-form';

type Sort = NonNullable<SapListQuery['sort']>;
type CollectionFilter = NonNullable<SapListQuery['collection']>;

const PAGE_SIZE = 20;
const sortOptions = [
  { value: '-collectedOn', label: 'Newest first' },
  { value: 'collectedOn', label: 'Oldest first' },
] as const satisfies readonly { value: Sort; label: string }[];
const collectionOptions = [
  { value: 'stand', label: 'Whole stand' },
  { value: 'bucket', label: collectionLabels.bucket },
  { value: 'gravity', label: collectionLabels.gravity },
  { value: 'vacuum', label: collectionLabels.vacuum },
] as const satisfies readonly { value: CollectionFilter; label: string }[];

const th = 'whitespace-nowrap px-2 py-1';
const td = 'whitespace-nowrap px-2 py-1 text-right';

/** The season's sap entries one by one, with a correction for those who record. */
export function SapEntries({
  sugarbushId,
  season,
  units,
  mayRecord,
}: {
  sugarbushId: number;
  season: number;
  units: SeasonUnits;
  mayRecord: boolean;
}) {
  const [sort, setSort] = useState<Sort>('-collectedOn');
  const [collection, setCollection] = useState<CollectionFilter>();
  const [page, setPage] = useState(1);
  const [correcting, setCorrecting] = useState<SapEntry>();
  const [notice, setNotice] = useState<string>();
  const list = useSapEntries(sugarbushId, { season, sort, collection, page, pageSize: PAGE_SIZE });

  return (
    <section aria-labelledby="sap-entries-heading" className="flex flex-col gap-3">
      <h2 id="sap-entries-heading" className="text-lg font-bold">
        Sap entries
      </h2>
      <div className="flex flex-wrap gap-3">
        <SelectField
          label="Order"
          options={sortOptions}
          value={sort}
          onChange={(v) => {
            setSort(v);
            setPage(1);
          }}
          className="w-44"
        />
        <SelectField
          label="Collection"
          all="Every collection"
          options={collectionOptions}
          value={collection}
          onChange={(v) => {
            setCollection(v);
            setPage(1);
          }}
          className="w-52"
        />
      </div>
      <p role="status" className="text-moss empty:hidden">
        {notice}
      </p>
      {correcting && (
        <div className="flex flex-col gap-2">
          <SapForm
            key={correcting.id}
            sugarbushId={sugarbushId}
            units={units}
            entry={correcting}
            onCorrected={(e) => {
              setCorrecting(undefined);
              setNotice(`Corrected the entry of ${formatDate(e.collectedOn)}.`);
            }}
          />
          <Button className="self-start" onClick={() => setCorrecting(undefined)}>
            Cancel the correction
          </Button>
        </div>
      )}
      {list.isPending ? (
        <TableSkeleton rows={5} label="Loading the sap entries" />
      ) : list.isError ? (
        <ErrorState
          title="We couldn't load the sap entries."
          error={list.error}
          onRetry={() => void list.refetch()}
        />
      ) : list.data.total === 0 ? (
        <p className="text-bark">
          {collection ? 'No entries from this collection in ' : 'No entries in '}
          {season}.
        </p>
      ) : (
        <>
          <div
            role="group"
            aria-label={`Sap entries of ${season}, scrolls sideways`}
            tabIndex={0}
            className="relative overflow-x-auto"
          >
            <table
              aria-label={`Sap entries of ${season}`}
              className="w-full border-collapse text-left text-sm tabular-nums"
            >
              <thead>
                <tr className="border-b-2 border-ink/70">
                  <th scope="col" className={th}>
                    Date
                  </th>
                  <th scope="col" className={th}>
                    Collection
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Sap
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Sugar
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Held at
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Syrup expected (86 / revised)
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Syrup made
                  </th>
                  <th scope="col" className={cn(th, 'text-right')}>
                    Per tap
                  </th>
                  <th scope="col" className={th}>
                    Keep it cold
                  </th>
                  <th scope="col" className={th}>
                    Note
                  </th>
                  {mayRecord && (
                    <th scope="col" className={th}>
                      <span className="sr-only">Correction</span>
                    </th>
                  )}
                </tr>
              </thead>
              <tbody>
                {list.data.items.map((e) => (
                  <tr key={e.id} data-sap-entry={e.id} className="border-b border-rule align-top">
                    <th scope="row" className={cn(th, 'font-normal')}>
                      {formatDate(e.collectedOn)}
                    </th>
                    <td className={th}>
                      {e.collection ? collectionLabels[e.collection] : 'Whole stand'}
                    </td>
                    <td className={td}>{formatVolume(e.volumeL, units.volume)}</td>
                    <td className={td}>{formatBrix(e.sugarPct)}</td>
                    <td className={td}>
                      {e.heldAtC === null ? '—' : formatTemperature(e.heldAtC, units.temperature)}
                    </td>
                    <td className={td}>
                      {formatVolume(e.expectedSyrupL, units.volume)} /{' '}
                      {formatVolume(e.expectedSyrupLRevised, units.volume)}
                    </td>
                    <td className={td}>{formatVolume(e.syrupMadeL, units.volume)}</td>
                    <td className={td}>
                      {e.yieldPerTapL === null ? '—' : formatVolume(e.yieldPerTapL, units.volume)}
                      <span className="block text-bark">
                        {formatNumber(e.taps)} {e.taps === 1 ? 'tap' : 'taps'}
                      </span>
                    </td>
                    <td className="min-w-48 px-2 py-1">
                      <SapCautions cautions={entryCautions(e, units.temperature)} compact />
                    </td>
                    <td className="min-w-32 max-w-prose px-2 py-1">{e.note ?? ''}</td>
                    {mayRecord && (
                      <td className="px-2 py-1">
                        <Button
                          variant="quiet"
                          aria-label={`Correct the entry of ${formatDate(e.collectedOn)}${e.collection ? `, ${collectionLabels[e.collection].toLowerCase()}` : ''}`}
                          onClick={() => {
                            setNotice(undefined);
                            setCorrecting(e);
                          }}
                        >
                          Correct
                        </Button>
                      </td>
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pager label="Sap entry pages" list={list.data} onPage={setPage} />
        </>
      )}
    </section>
  );
}
