import '../lib/leaflet-setup';
import L from 'leaflet';
import { useEffect, useRef, useState } from 'react';
import { BOUNDARY_FILE_EXTENSIONS, readBoundaryFile } from '@shared/geo/boundary-file';
import type { BoundaryCandidate, SkippedShape } from '@shared/geo/boundary-shapes';
import type { Boundary } from '@shared/schemas/sugarbush';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { colors } from '@/lib/theme';
import type { UnitSystem } from '@/lib/units';
import { useUpdateBoundary } from '../api/update-boundary';
import { readFileBytes } from '../lib/read-file-bytes';
import { BoundaryChoice } from './boundary-choice';
import { boundaryRenderer, boundaryStyle } from './boundary-layer';

type Stage = 'idle' | 'reading' | 'choosing' | 'drawing' | 'editing';
type Found = { fileName: string; candidates: BoundaryCandidate[]; skipped: SkippedShape[] };

const serverMessage = (error: unknown) =>
  isApiError(error)
    ? (error.fields?.boundary ?? error.message)
    : 'The boundary could not be saved. Try again.';

interface BoundaryToolsProps {
  sugarbushId: number;
  boundary: Boundary | null;
  map: L.Map | null;
  /** While the outline is being edited the saved one is hidden, so only one shows. */
  onEditingChange: (editing: boolean) => void;
  system: UnitSystem;
}

/**
 * Import an outline from a GIS file (GeoJSON, KML or KMZ, GPX, zipped Shapefile; several outlines in
 * one file are chosen from or merged), or draw and edit the boundary on the map.
 */
export function BoundaryTools({
  sugarbushId,
  boundary,
  map,
  onEditingChange,
  system,
}: BoundaryToolsProps) {
  const save = useUpdateBoundary(sugarbushId);
  const [stage, setStage] = useState<Stage>('idle');
  const [found, setFound] = useState<Found | null>(null);
  const [message, setMessage] = useState<{ kind: 'error' | 'done'; text: string } | null>(null);
  const draft = useRef<L.Polygon | null>(null);
  const onCreate = useRef<((event: { layer: L.Layer }) => void) | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);

  const finish = () => {
    if (onCreate.current) map?.off('pm:create', onCreate.current);
    onCreate.current = null;
    map?.pm.disableDraw();
    draft.current?.pm.disable();
    draft.current?.remove();
    draft.current = null;
    setFound(null);
    setStage('idle');
    onEditingChange(false);
  };

  // Leaving the page mid-edit leaves nothing behind on the map.
  useEffect(
    () => () => {
      draft.current?.remove();
    },
    [],
  );

  const edit = (layer: L.Polygon) => {
    draft.current = layer;
    layer.pm.enable({ allowSelfIntersection: false });
    setStage('editing');
  };

  const startDraw = () => {
    if (!map) return;
    setMessage(null);
    onEditingChange(true);
    if (boundary) {
      const layer = L.geoJSON(boundary, {
        style: { ...boundaryStyle(boundaryRenderer(map)), interactive: true },
      }).getLayers()[0] as L.Polygon;
      layer.addTo(map);
      map.fitBounds(layer.getBounds(), { padding: [24, 24] });
      edit(layer);
      return;
    }
    setStage('drawing');
    onCreate.current = (event) => {
      if (onCreate.current) map.off('pm:create', onCreate.current);
      onCreate.current = null;
      map.pm.disableDraw();
      edit(event.layer as L.Polygon);
    };
    map.on('pm:create', onCreate.current);
    map.pm.enableDraw('Polygon', {
      tooltips: false,
      snappable: false,
      allowSelfIntersection: false,
      templineStyle: { color: colors.bark },
      hintlineStyle: { color: colors.bark, dashArray: [5, 5] },
      pathOptions: { ...boundaryStyle(boundaryRenderer(map)), interactive: true },
    });
  };

  const send = (next: Boundary, done: string) => {
    save.mutate(next, {
      onSuccess: () => {
        setMessage({ kind: 'done', text: done });
        finish();
      },
      onError: (error) => setMessage({ kind: 'error', text: serverMessage(error) }),
    });
  };

  const saveDraft = () => {
    const geometry = draft.current?.toGeoJSON().geometry;
    if (!geometry || (geometry.type !== 'Polygon' && geometry.type !== 'MultiPolygon')) {
      setMessage({ kind: 'error', text: 'Close the outline before saving it.' });
      return;
    }
    send(geometry as Boundary, 'Boundary saved.');
  };

  const importFile = async (file: File) => {
    setMessage(null);
    setStage('reading');
    let result;
    try {
      result = await readBoundaryFile(file.name, await readFileBytes(file));
    } catch {
      result = { error: `${file.name} could not be read. Try exporting it again.` };
    }
    if ('error' in result) {
      setStage('idle');
      setMessage({ kind: 'error', text: result.error });
      return;
    }
    const { candidates, skipped } = result;
    if (candidates.length === 1 && skipped.length === 0) {
      setStage('idle');
      send(candidates[0].geometry, `Boundary imported from ${file.name}.`);
      return;
    }
    // The saved outline is hidden while the file's are drawn for the choice.
    onEditingChange(true);
    setFound({ fileName: file.name, candidates, skipped });
    setStage('choosing');
  };

  const saveChoice = (next: Boundary) =>
    save.mutateAsync(next).then(() => {
      setMessage({
        kind: 'done',
        text: `Boundary imported from ${found?.fileName ?? 'the file'}.`,
      });
      finish();
    });

  return (
    <div className="flex flex-col gap-2">
      <h3 className="text-sm font-bold">Boundary</h3>
      {stage === 'reading' ? (
        <p role="status" className="text-sm">
          Reading the file…
        </p>
      ) : stage === 'choosing' && found ? (
        <BoundaryChoice
          {...found}
          system={system}
          map={map}
          onSave={saveChoice}
          onCancel={finish}
        />
      ) : stage === 'idle' ? (
        <div className="flex flex-wrap gap-2">
          <input
            ref={fileInput}
            type="file"
            accept={[...BOUNDARY_FILE_EXTENSIONS, 'application/geo+json'].join(',')}
            aria-label="Boundary file"
            className="sr-only"
            tabIndex={-1}
            onChange={(e) => {
              const file = e.target.files?.[0];
              e.target.value = '';
              if (file) void importFile(file);
            }}
          />
          <Button onClick={() => fileInput.current?.click()} disabled={save.isPending}>
            Import boundary file
          </Button>
          <Button onClick={startDraw} disabled={!map || save.isPending}>
            {boundary ? 'Edit boundary' : 'Draw boundary'}
          </Button>
        </div>
      ) : (
        <div className="flex flex-col gap-2 rounded bg-frost/70 p-3 text-sm">
          <p>
            {stage === 'drawing'
              ? 'Click each corner of the stand in turn, then click the first corner again to close the outline.'
              : 'Drag the corners to fit the stand; drag a midpoint to add a corner. Save when it fits.'}
          </p>
          <div className="flex gap-2">
            {stage === 'editing' && (
              <Button variant="primary" onClick={saveDraft} disabled={save.isPending}>
                {save.isPending ? 'Saving…' : 'Save boundary'}
              </Button>
            )}
            <Button onClick={finish} disabled={save.isPending}>
              Cancel
            </Button>
          </div>
        </div>
      )}
      {message && (
        <p
          role={message.kind === 'error' ? 'alert' : 'status'}
          className={message.kind === 'error' ? 'text-sm text-alert' : 'text-sm text-moss'}
        >
          {message.text}
        </p>
      )}
    </div>
  );
}
