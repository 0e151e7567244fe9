import { Link } from 'react-router';
import { speciesLabels } from '@shared/schemas/enums';
import { HazardNotice } from '@/components/hazard-notice';
import { TreeStatusLabel } from '@/components/tree-status-label';
import { Button } from '@/components/ui/button';
import { VerdictBadge } from '@/components/verdict-badge';
import { WarningChip } from '@/components/warning-chip';
import { paths } from '@/config/paths';
import type { LengthUnit } from '@/lib/units';
import { useTreeDetails } from '../api/get-tree-details';
import type { MapTree } from '../lib/map-stand';
import { TreeCardDetails, TreeCardFigures } from './tree-card-details';

export interface MoveState {
  /** The marker has been dropped somewhere new and waits for a yes or no. */
  dropped: boolean;
  saving: boolean;
  error?: string;
}

interface TreeCardProps {
  tree: MapTree;
  /** The season the map shows: the card's advice is for the same one. */
  season: number;
  unit: LengthUnit;
  canEdit: boolean;
  move: MoveState | null;
  onClose: () => void;
  onMoveToggle: (on: boolean) => void;
  onMoveSave: () => void;
}

function tapsLine(tree: MapTree): string {
  if (tree.taps === 0) return 'No taps this season';
  return tree.taps === 1 ? 'Tap once' : `Tap ${tree.taps} times`;
}

/**
 * One tree at a glance: what it is, what to do with it this season, and where to drill. What
 * the map already has shows at once; the DBH, the last measurement and the placements are
 * asked for when the tree is chosen.
 */
export function TreeCard({
  tree,
  season,
  unit,
  canEdit,
  move,
  onClose,
  onMoveToggle,
  onMoveSave,
}: TreeCardProps) {
  const mapped = tree.lat !== null && tree.lng !== null;
  const details = useTreeDetails(tree.id, season);
  return (
    <section
      aria-label={`Tree ${tree.tag}`}
      className="rounded border border-rule bg-paper p-4 shadow-sm"
    >
      <div className="flex items-start justify-between gap-2">
        <h2 className="text-lg font-bold">Tree {tree.tag}</h2>
        <Button variant="quiet" onClick={onClose} aria-label="Close tree card" className="-mr-2">
          ✕
        </Button>
      </div>
      {/* A hazard at the tree comes before anything about tapping it. */}
      <HazardNotice hazards={details.advice.data?.hazards} className="mt-2" />
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-sm">
        <dt className="font-bold">Species</dt>
        <dd>{speciesLabels[tree.species]}</dd>
        <dt className="font-bold">Status</dt>
        <dd>
          <TreeStatusLabel status={tree.status} />
        </dd>
        <TreeCardFigures details={details} unit={unit} />
        <dt className="font-bold">Advice</dt>
        <dd>
          <VerdictBadge verdict={tree.verdict} />
        </dd>
      </dl>

      <p className="mt-3 font-bold">{tapsLine(tree)}</p>
      <TreeCardDetails details={details} tapped={tree.taps > 0} unit={unit} />

      {tree.warnings.length > 0 && (
        <ul aria-label="Warnings" className="mt-3 flex flex-wrap gap-1.5">
          {tree.warnings.map((code) => (
            <li key={code}>
              <WarningChip code={code} />
            </li>
          ))}
        </ul>
      )}
      {tree.outside && (
        <p className="mt-3 text-sm text-bark">This tree is mapped outside the stand boundary.</p>
      )}
      {!mapped && <p className="mt-3 text-sm text-bark">This tree has no position yet.</p>}

      <div className="mt-4 flex flex-wrap items-center gap-3">
        <Link to={paths.tree.href(tree.id)} className="font-bold underline underline-offset-4">
          Open tree {tree.tag}
        </Link>
        {canEdit && (
          <Button
            aria-pressed={move !== null}
            onClick={() => onMoveToggle(move === null)}
            disabled={move?.saving}
          >
            {mapped ? 'Move this tree' : 'Place this tree'}
          </Button>
        )}
      </div>

      {move && (
        <div className="mt-3 rounded bg-frost/70 p-3 text-sm" aria-live="polite">
          {move.dropped ? (
            <>
              <p className="font-bold">Save new position?</p>
              <div className="mt-2 flex gap-2">
                <Button variant="primary" onClick={onMoveSave} disabled={move.saving}>
                  {move.saving ? 'Saving…' : 'Save'}
                </Button>
                <Button onClick={() => onMoveToggle(false)} disabled={move.saving}>
                  Cancel
                </Button>
              </div>
            </>
          ) : (
            <p>Drag the ringed marker to where the tree stands.</p>
          )}
          {move.error && (
            <p role="alert" className="mt-2 text-alert">
              {move.error}
            </p>
          )}
        </div>
      )}
    </section>
  );
}
