import type { TrunkMark } from '@/lib/trunk-holes';

/** What the trunk diagram's marks mean; only the kinds it draws. */
export function TrunkLegend({
  has,
  season,
}: {
  has: (kind: TrunkMark['kind']) => boolean;
  season: number;
}) {
  return (
    <p className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-bark">
      {has('advised') && (
        <span className="inline-flex items-center gap-1">
          <span
            aria-hidden="true"
            className="inline-block size-3 rounded-full border-[3px] border-sap bg-paper"
          />
          Advised spot
        </span>
      )}
      {has('this-season') && (
        <span className="inline-flex items-center gap-1">
          <span aria-hidden="true" className="inline-block size-3 rounded-full bg-moss" />
          Drilled in {season}
        </span>
      )}
      {has('earlier') && (
        <span className="inline-flex items-center gap-1">
          <span aria-hidden="true" className="inline-block h-3 w-2 bg-bark/50" />
          Earlier hole and its stain, fading as the tree grows over it
        </span>
      )}
      <span className="inline-flex items-center gap-1">
        <span aria-hidden="true" className="inline-block h-3 w-4 bg-frost ring-1 ring-rule" />
        Tapping band
      </span>
    </p>
  );
}
