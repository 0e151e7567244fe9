import { useState } from 'react';
import { useBasemaps } from '../api/get-basemaps';
import { useDemoTiles } from '../api/get-demo-tiles';
import type { Basemap } from '@shared/schemas/map';
import {
  availableBackground,
  basemapIdOf,
  boundsOf,
  demoCovers,
  readBackground,
  storeBackground,
  type BackgroundChoice,
} from '../lib/background';
import type { Background } from './background-layer';
import { BackgroundPicker } from './background-picker';
import { BasemapUpload } from './basemap-upload';

/** The background on offer for this stand, the one chosen, and the layer to draw for it. */
export function useBackground(
  sugarbushId: number,
  mapped: readonly { lat: number; lng: number }[],
) {
  const demo = useDemoTiles();
  const basemaps = useBasemaps(sugarbushId);
  const [stored, setStored] = useState<BackgroundChoice>(() => readBackground(sugarbushId));
  const demoOffered = demo.isPending ? undefined : demoCovers(demo.data, boundsOf(mapped));
  const items = basemaps.data?.items ?? (basemaps.isError ? [] : undefined);
  const choice = availableBackground(stored, { demo: demoOffered, basemaps: items });

  const id = basemapIdOf(choice);
  const basemap = id === undefined ? undefined : items?.find((b) => b.id === id);
  const layer: Background =
    choice === 'demo' && demo.data
      ? { kind: 'demo', demo: demo.data }
      : basemap
        ? { kind: 'basemap', basemap }
        : { kind: 'plain' };

  const choose = (next: BackgroundChoice) => {
    storeBackground(sugarbushId, next);
    setStored(next);
  };

  return {
    choice,
    choose,
    layer,
    demoOffered: demoOffered === true,
    basemaps: items ?? [],
    basemapsError: basemaps.isError ? basemaps.error : null,
  };
}

export type BackgroundState = ReturnType<typeof useBackground>;

export function MapBackgrounds({
  sugarbushId,
  canEdit,
  state,
}: {
  sugarbushId: number;
  canEdit: boolean;
  state: BackgroundState;
}) {
  return (
    <div className="flex flex-col gap-3">
      <BackgroundPicker
        value={state.choice}
        onChange={state.choose}
        demo={state.demoOffered}
        basemaps={state.basemaps}
      />
      {state.basemapsError && (
        <p role="alert" className="text-sm text-alert">
          The uploaded basemaps could not be listed: {state.basemapsError.message}
        </p>
      )}
      {canEdit && (
        <BasemapUpload
          sugarbushId={sugarbushId}
          onUploaded={(b: Basemap) => state.choose(`basemap:${b.id}`)}
        />
      )}
    </div>
  );
}
