import type { GuidelineProfile, TapBand } from './profile-types';
import { warn, type AdvisorWarning } from './warnings';

/** Everything the count of this season's taps depends on, worked out by the advisor. */
export interface TapCountInput {
  profile: GuidelineProfile;
  band: TapBand;
  dbhCm: number;
  /** A recent crown rating, or null when there is none to go by. */
  diebackPct: number | null;
  severe: boolean;
  stressed: boolean;
  /** Measured basal-area growth (in²/yr); null while it is unknown or suspect. */
  basalAreaGrowthIn2: number | null;
  /** The growth behind the zone model is assumed, not measured. */
  growthAssumed: boolean;
  /** Healthy and growing at least the typical rate: keeps a fast-growers-only top count. */
  fastGrower: boolean;
  /** The advised bit is for 7/16 in spouts. */
  wideBit: boolean;
  /** Growth is below what even one tap needs: the tree is drilled shallow. */
  slow: boolean;
  /** Basal-area growth (in²/yr) this many taps a year need at the advised bit and depth. */
  needs: (taps: number) => number;
  /** What one tap needs at the depth the slow-growth test used. */
  oneTapNeedsIn2: number;
  /** Most taps a year the growth carries at the advised bit and depth (the zone model). */
  carried: number;
  shareNow: number;
  /** Share of the zone one new hole stains. */
  perNewHole: number;
}

export interface TapCount {
  taps: number;
  /** Taps before the growth rules: what the tree would carry on its size and health. */
  wanted: number;
  /** The count the guideline gives a healthy tree of this size. */
  guidelineTaps: number;
  reasons: string[];
  warnings: AdvisorWarning[];
}

/** A top band "for healthy fast growers only" gives one tap fewer to every other tree. */
export function guidelineCount(profile: GuidelineProfile, band: TapBand): number {
  const taps = Math.min(band.taps, profile.maxTaps);
  return band.fullOnlyForHealthyFastGrowers ? taps - 1 : taps;
}

/**
 * The guideline's count for a healthy tree (its full top count for a healthy fast grower), then
 * each rule that can only lower it, in order: crown dieback and stress, 7/16 in spouts, slow
 * growth, the growth the tapping zone needs, the zone's floor.
 */
export function countTaps(input: TapCountInput): TapCount {
  const { profile, band } = input;
  const rules = profile.stressed;
  const floor = profile.zone.floor;
  const reasons: string[] = [];
  const warnings: AdvisorWarning[] = [];
  const guidelineTaps = guidelineCount(profile, band);
  let taps = guidelineTaps;
  const grew = input.basalAreaGrowthIn2;
  // The zone model still checks below that the growth carries the full count.
  if (band.fullOnlyForHealthyFastGrowers && input.fastGrower && !input.stressed)
    taps = Math.min(band.taps, profile.maxTaps);
  const cap = (most: number, reason: string) => {
    if (most < taps) {
      taps = Math.max(0, most);
      reasons.push(reason);
    }
  };

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
  if (input.wideBit) {
    cap(1, 'With 7/16 in spouts, one tap at most.');
    warnings.push(warn.wideBit());
  }
  const wanted = taps;
  if (input.slow && grew !== null) {
    cap(1, 'Growth is below what even one tap needs: one shallow tap at most.');
    warnings.push(warn.slowGrowth(grew, input.oneTapNeedsIn2));
  }
  if (input.carried < taps) {
    const before = taps;
    cap(
      input.carried,
      input.growthAssumed
        ? 'At the slow growth assumed until the tree is measured again, more holes would outpace the clear wood it lays down.'
        : 'At this growth, more holes would outpace the clear wood the tree lays down.',
    );
    if (!input.slow && grew !== null)
      warnings.push(warn.growthLimitsTaps(before, input.carried, grew, input.needs(before)));
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
  return { taps, wanted, guidelineTaps, reasons, warnings };
}
