import { toLatLng, type Origin } from './geo';
import { growTree } from './growth';
import { round } from './random';
import { tapTree, type TappingOptions } from './tapping';
import type { TreePlan, TreeSpec } from './types';

/** Turns tree specs into the rows the database receives: position, yearly readings, tapholes. */
export function planTrees(origin: Origin, specs: TreeSpec[], tapping: TappingOptions): TreePlan[] {
  return specs.map((spec) => {
    const growth = growTree(tapping.key, spec, tapping.lastSeason);
    const at = spec.xy ? toLatLng(origin, spec.xy) : null;
    return {
      spec,
      lat: at ? round(at.lat, 7) : null,
      lng: at ? round(at.lng, 7) : null,
      measurements: growth.measurements,
      tapholes: tapTree(spec, growth, tapping),
    };
  });
}
