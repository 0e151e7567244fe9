import '../lib/leaflet-setup';
import { zodResolver } from '@hookform/resolvers/zod';
import L from 'leaflet';
import { useEffect, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { acresFromM2, boundaryAreaM2, hectaresFromM2 } from '@shared/geo/area';
import type { Boundary } from '@shared/geo/boundary';
import {
  mergeOutlines,
  type BoundaryCandidate,
  type SkippedShape,
} from '@shared/geo/boundary-shapes';
import { Button } from '@/components/ui/button';
import { applyServerErrors } from '@/lib/form-errors';
import { colors } from '@/lib/theme';
import { formatNumber, type UnitSystem } from '@/lib/units';

/** The outlines kept, by their number in the file's list; one is the stand, several are merged. */
const choiceSchema = z.object({
  chosen: z.array(z.string()).min(1, "Choose the stand's outline, or several to merge into one."),
});
type Choice = z.infer<typeof choiceSchema>;

/** "12.4 acres (5.0 ha)", the user's own system first. */
export function areaText(m2: number, system: UnitSystem): string {
  const acres = `${formatNumber(acresFromM2(m2), 1)} acres`;
  const ha = `${formatNumber(hectaresFromM2(m2), 1)} ha`;
  return system === 'imperial' ? `${acres} (${ha})` : `${ha} (${acres})`;
}

interface BoundaryChoiceProps {
  fileName: string;
  candidates: BoundaryCandidate[];
  skipped: SkippedShape[];
  system: UnitSystem;
  map: L.Map | null;
  /** Saves the boundary; a refusal rejects with the API's error. */
  onSave: (boundary: Boundary) => Promise<unknown>;
  onCancel: () => void;
}

/** Outlines drawn while choosing: the chosen ones solid, the others dashed. No labels on the map. */
function useCandidatePreview(map: L.Map | null, candidates: BoundaryCandidate[], chosen: string[]) {
  const [layer] = useState(() => L.featureGroup());
  useEffect(() => {
    if (!map) return;
    layer.addTo(map);
    const bounds = L.geoJSON(candidates.map((c) => c.geometry)).getBounds();
    if (bounds.isValid()) map.fitBounds(bounds, { padding: [24, 24] });
    return () => {
      layer.remove();
    };
  }, [map, layer, candidates]);
  useEffect(() => {
    layer.clearLayers();
    candidates.forEach((c, i) => {
      const on = chosen.includes(String(i));
      L.geoJSON(c.geometry, {
        interactive: false,
        style: {
          color: colors.bark,
          weight: on ? 3 : 2,
          dashArray: on ? undefined : '6 6',
          fillOpacity: on ? 0.15 : 0,
        },
      }).addTo(layer);
    });
  }, [layer, candidates, chosen]);
}

/** The file held several outlines: pick the stand's, or merge several, before anything is saved. */
export function BoundaryChoice({
  fileName,
  candidates,
  skipped,
  system,
  map,
  onSave,
  onCancel,
}: BoundaryChoiceProps) {
  const form = useForm<Choice>({
    resolver: zodResolver(choiceSchema),
    defaultValues: { chosen: [] },
  });
  const [formError, setFormError] = useState<string | null>(null);
  const chosen = form.watch('chosen');
  useCandidatePreview(map, candidates, chosen);

  const merged = useMemo(
    () =>
      chosen.length > 1 ? mergeOutlines(chosen.map((i) => candidates[Number(i)].geometry)) : null,
    [chosen, candidates],
  );

  const submit = form.handleSubmit(async ({ chosen: picked }) => {
    setFormError(null);
    const check = mergeOutlines(picked.map((i) => candidates[Number(i)].geometry));
    if (!check.ok) return setFormError(`These outlines cannot be merged: ${check.message}.`);
    try {
      await onSave(check.boundary);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ['chosen']));
    }
  });

  const error = form.formState.errors.chosen?.message;
  const saving = form.formState.isSubmitting;
  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex flex-col gap-3 rounded bg-frost/70 p-3 text-sm"
    >
      <fieldset
        className="flex flex-col gap-1"
        aria-describedby={error ? 'boundary-choice-error' : undefined}
      >
        <legend className="mb-1 font-bold">
          {candidates.length === 1
            ? `${fileName} holds one usable outline. Check it and save it.`
            : `${fileName} holds ${candidates.length} outlines. Choose the stand's, or several to merge.`}
        </legend>
        {candidates.map((c, i) => (
          <label key={i} className="flex min-h-11 items-center gap-3 md:min-h-9">
            <input
              type="checkbox"
              value={String(i)}
              className="h-5 w-5"
              {...form.register('chosen')}
            />
            <span className="font-bold">{c.name}</span>
            <span className="tabular-nums text-bark">{areaText(c.areaM2, system)}</span>
          </label>
        ))}
      </fieldset>
      {merged && (
        <p role="status">
          {merged.ok
            ? `Merged: ${areaText(boundaryAreaM2(merged.boundary), system)}, ${
                merged.boundary.type === 'Polygon'
                  ? 'one outline (they touch or overlap)'
                  : `${merged.boundary.coordinates.length} separate parts`
              }.`
            : `These outlines cannot be merged: ${merged.message}.`}
        </p>
      )}
      {skipped.length > 0 && (
        <div>
          <p>Left out of the list:</p>
          <ul className="list-disc pl-5">
            {skipped.map((s, i) => (
              <li key={i}>
                “{s.name}” {s.reason}.
              </li>
            ))}
          </ul>
        </div>
      )}
      {(error || formError) && (
        <p id="boundary-choice-error" role="alert" className="text-alert">
          {error ?? formError}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="primary" disabled={saving}>
          {saving
            ? 'Saving…'
            : chosen.length > 1
              ? `Merge ${chosen.length} outlines and save`
              : 'Save this outline'}
        </Button>
        <Button onClick={onCancel} disabled={saving}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
