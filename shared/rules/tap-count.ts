import type { GrowthLinePoint } from './minimum-growth';
import { healthyGrowthLine } from './minimum-growth';
import type { GuidelineProfile, TapBand } from './profile-types';
import { warn, type AdvisorWarning } from './warnings';

/** Everything the count of this season's taps depends on, worked out by the advisor. */
export interface TapCountInput {
  profile: GuidelineProfile;
  band: TapBand;
  dbhCm: number;
  dbhIn: number;
  diebackPct: number | null;
  severe: boolean;
  stressed: boolean;
  basalAreaGrowthIn2: number | null;
  growthAssumed: boolean;
  minimumLine: GrowthLinePoint;
  wideSpout: boolean;
  spoutTooWide: boolean;
  maxSustainableTaps: number;
  shareNow: number;
  /** Share of the zone one new hole stains. */
  perNewHole: number;
}

export interface TapCount {
  taps: number;
  slow: boolean;
  reasons: string[];
  warnings: AdvisorWarning[];
}

/**
 * The table count, then each rule that can only lower it, in order: the fast-grower condition,
 * crown dieback and stress, wide spouts, slow growth, the growth the zone needs, the zone's floor.
 */
export function countTaps(input: TapCountInput): TapCount {
  const { profile, band, minimumLine: line } = input;
  const rules = profile.stressed;
  const floor = profile.zone.floor;
  const reasons: string[] = [];
  const warnings: AdvisorWarning[] = [];
  let taps = Math.min(band.taps, profile.maxTaps);
  const cap = (most: number, reason: string) => {
    if (most < taps) {
      taps = Math.max(0, most);
      reasons.push(reason);
    }
  };
  const grew = input.basalAreaGrowthIn2;
  const slow = grew !== null && grew < line.in2PerYear;

  if (band.fullOnlyForHealthyFastGrowers) {
    const fast = grew !== null && grew >= healthyGrowthLine(input.dbhIn).in2PerYear;
    if (!fast || input.stressed)
      cap(band.taps - 1, 'The top count is for healthy, fast-growing trees only.');
  }
  if (input.severe) {
    cap(0, 'Severe crown dieback: rest the tree.');
    warnings.push(warn.severeDieback(input.diebackPct!));
  } else if (input.stressed) {
    cap(
      rules.maxTaps,
      `A stressed tree takes ${rules.maxTaps} tap${rules.maxTaps === 1 ? '' : 's'} at most.`,
    );
    if (input.dbhCm < rules.noneBelowCm - 1e-9) cap(0, 'A stressed tree this small takes none.');
    if (input.diebackPct !== null && input.diebackPct > rules.diebackPct) {
      warnings.push(
        warn.dieback(input.diebackPct, rules.diebackPct, rules.maxTaps, rules.noneBelowCm),
      );
    }
  }
  if (input.wideSpout) {
    cap(1, 'With 7/16 in spouts, one tap at most.');
    warnings.push(warn.wideSpout());
  } else if (input.spoutTooWide) {
    warnings.push(warn.spoutTooWide(profile.limits.maxBitCm, profile.depthSource));
  }
  if (slow) {
    cap(1, 'Growth is below the published minimum: one tap at most.');
    warnings.push(warn.slowGrowth(grew, line.in2PerYear, line.extrapolated));
  }
  if (input.maxSustainableTaps < taps) {
    const before = taps;
    cap(
      input.maxSustainableTaps,
      'At this growth, more holes would outpace the clear wood the tree lays down.',
    );
    if (!slow && !input.growthAssumed)
      warnings.push(warn.rateTooFast(before, input.maxSustainableTaps));
  }
  if (input.shareNow < floor) {
    cap(0, 'The tapping zone is below its clear-wood floor.');
    warnings.push(warn.depleted(input.shareNow, floor));
  } else {
    const fit = Math.floor((input.shareNow - floor) / input.perNewHole + 1e-9);
    if (fit < taps) {
      warnings.push(warn.nearlyDepleted(fit, taps, floor));
      cap(fit, 'More holes would take the tapping zone below its clear-wood floor.');
    }
  }
  return { taps, slow, reasons, warnings };
}
