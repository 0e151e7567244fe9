import { Button } from '@/components/ui/button';
import { formatNumber, type UnitSystem } from '@/lib/units';
import type { Position } from '@/lib/use-geolocation';

interface FieldToolsProps {
  canEdit: boolean;
  system: UnitSystem;
  locating: boolean;
  position: Position | null;
  message: string | null;
  picking: boolean;
  onLocate: () => void;
  onAddHere: () => void;
  onPickToggle: (on: boolean) => void;
}

/** Out in the stand: where am I, and adding the tree in front of me. */
export function FieldTools({
  canEdit,
  system,
  locating,
  position,
  message,
  picking,
  onLocate,
  onAddHere,
  onPickToggle,
}: FieldToolsProps) {
  return (
    <div className="flex flex-col gap-2">
      <h3 className="text-sm font-bold">In the field</h3>
      <div className="flex flex-wrap gap-2">
        <Button onClick={onLocate} disabled={locating} block>
          {locating ? 'Finding you…' : 'Where am I'}
        </Button>
        {canEdit && (
          <>
            <Button onClick={onAddHere} disabled={locating} block>
              Add tree here
            </Button>
            <Button aria-pressed={picking} onClick={() => onPickToggle(!picking)} block>
              {picking ? 'Stop adding by click' : 'Add tree by clicking the map'}
            </Button>
          </>
        )}
      </div>
      {picking && (
        <p role="status" className="text-sm">
          Click the map where the tree stands.
        </p>
      )}
      {position && !message && (
        <p className="text-sm text-bark tabular-nums" role="status">
          You are here, to within{' '}
          {system === 'imperial'
            ? `${formatNumber(position.accuracyM / 0.3048)} ft`
            : `${formatNumber(position.accuracyM)} m`}
          .
        </p>
      )}
      {message && (
        <p role="alert" className="text-sm text-alert">
          {message}
        </p>
      )}
    </div>
  );
}
