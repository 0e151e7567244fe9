import { sapPerSyrup } from './sap';
import { cToF, fToC } from './units';
import { freezeThaw, type SapRunOutlook } from './weather';

/** A day's sap run as the season log records it. */
export type RunClass = 'none' | 'run' | 'strong';
export type TemperatureUnit = 'C' | 'F';

export interface DayRun {
  run: RunClass;
  /** The finer outlook behind the class (a light run counts as a run). */
  outlook: SapRunOutlook;
  /** "−4 °C night, 5 °C day: a run" */
  reason: string;
}

const runOf: Record<SapRunOutlook, RunClass> = {
  'strong-run': 'strong',
  run: 'run',
  'light-run': 'run',
  'stays-frozen': 'none',
  'no-freeze': 'none',
};

const verdictOf: Record<SapRunOutlook, string> = {
  'strong-run': 'a strong run',
  run: 'a run',
  'light-run': 'a light run',
  'stays-frozen': 'no run, the day stays frozen',
  'no-freeze': 'no run, the night does not freeze',
};

/** A temperature held in °C, written in the chosen scale: "−4 °C", "25 °F", "−0.5 °C". */
export function formatTemperature(celsius: number, unit: TemperatureUnit = 'C'): string {
  const value = unit === 'F' ? cToF(celsius) : celsius;
  const rounded = Math.round(value * 10) / 10;
  const shown = Number.isInteger(rounded)
    ? Math.abs(rounded).toFixed(0)
    : Math.abs(rounded).toFixed(1);
  const sign = rounded < 0 ? '\u2212' : '';
  return `${sign}${shown} °${unit}`;
}

/**
 * A day classified by the freeze–thaw rule: a night below 32 °F and a day above it make a run;
 * a night near 25 °F before a day in the 40s °F a strong one (DOMAIN §5).
 */
export function classifyDay(minC: number, maxC: number, unit: TemperatureUnit = 'C'): DayRun {
  const outlook = freezeThaw(minC, maxC);
  const low = Math.min(minC, maxC);
  const high = Math.max(minC, maxC);
  return {
    run: runOf[outlook],
    outlook,
    reason: `${formatTemperature(low, unit)} night, ${formatTemperature(high, unit)} day: ${verdictOf[outlook]}`,
  };
}

export interface ExpectedSyrup {
  /** By the Rule of 86 (Jones): sap ÷ (86 / sugar %). */
  jones86: number;
  /** By the rule revised for 66.0 °Brix syrup: sap ÷ (87.1 / sugar % − 0.32). */
  revised66: number;
}

/** The syrup a volume of sap should make at this sugar content, in the sap's own unit. */
export function expectedSyrup(sapVolume: number, sugarPct: number): ExpectedSyrup {
  if (!(sapVolume >= 0) || !Number.isFinite(sapVolume)) {
    throw new RangeError('Sap volume must be a number of 0 or more');
  }
  return {
    jones86: sapVolume / sapPerSyrup(sugarPct, 'jones-86'),
    revised66: sapVolume / sapPerSyrup(sugarPct, 'revised-66'),
  };
}

export type SapCautionCode = 'warm-sap' | 'spoiling-sap';

export interface SapCaution {
  code: SapCautionCode;
  level: 'caution' | 'warning';
  message: string;
  source: string;
}

/** Sap held above about 40 °F spoils faster; above 50 °F, rapidly. */
export const SAP_COOL_LIMIT_F = 40;
export const SAP_WARM_LIMIT_F = 50;
const SPOILAGE_SOURCE = 'Ohio State University maple program: sap spoilage by temperature';

/** The keep-it-cold cautions for sap held at this temperature (none when not given). */
export function sapHoldingCautions(
  heldAtC: number | null | undefined,
  unit: TemperatureUnit = 'C',
): SapCaution[] {
  if (heldAtC === null || heldAtC === undefined || !Number.isFinite(heldAtC)) return [];
  const heldF = Math.round(cToF(heldAtC) * 1e6) / 1e6;
  const held = formatTemperature(heldAtC, unit);
  if (heldF > SAP_WARM_LIMIT_F) {
    return [
      {
        code: 'spoiling-sap',
        level: 'warning',
        message: `Sap held at ${held}: above ${formatTemperature(fToC(SAP_WARM_LIMIT_F), unit)} microbes grow fast and the sap spoils within hours. Boil it today, or cool it at once; sap that turns cloudy or sour makes dark, off-flavoured syrup.`,
        source: SPOILAGE_SOURCE,
      },
    ];
  }
  if (heldF > SAP_COOL_LIMIT_F) {
    return [
      {
        code: 'warm-sap',
        level: 'caution',
        message: `Sap held at ${held}: above ${formatTemperature(fToC(SAP_COOL_LIMIT_F), unit)} it spoils faster. Keep it shaded and cold, and boil it soon.`,
        source: SPOILAGE_SOURCE,
      },
    ];
  }
  return [];
}

export interface SapDay {
  volumeL: number;
  sugarPct: number;
  syrupMadeL?: number | null;
}

export interface SapSummary {
  volumeL: number;
  /** Sugar weighted by volume, or null without sap. */
  meanSugarPct: number | null;
  expectedSyrupL: number;
  expectedSyrupLRevised: number;
  /** Syrup made, where any entry gives it; null when none does. */
  syrupMadeL: number | null;
  /** Entries that give the syrup made. */
  entriesWithSyrup: number;
  /**
   * Syrup the Rule of 86 expects from the sap of those entries alone: what the syrup made
   * compares with (null when none gives it).
   */
  expectedSyrupLWhereMade: number | null;
  /** Sap per tap, or null without taps. */
  yieldPerTapL: number | null;
}

/** A season's (or a day's) sap added up, each entry converted at its own sugar content. */
export function summarizeSap(entries: readonly SapDay[], taps: number): SapSummary {
  let volumeL = 0;
  let sugarVolume = 0;
  let jones = 0;
  let revised = 0;
  let made: number | null = null;
  let withSyrup = 0;
  let expectedWhereMade = 0;
  for (const e of entries) {
    const syrup = expectedSyrup(e.volumeL, e.sugarPct);
    volumeL += e.volumeL;
    sugarVolume += e.volumeL * e.sugarPct;
    jones += syrup.jones86;
    revised += syrup.revised66;
    if (e.syrupMadeL !== null && e.syrupMadeL !== undefined) {
      made = (made ?? 0) + e.syrupMadeL;
      withSyrup += 1;
      expectedWhereMade += syrup.jones86;
    }
  }
  return {
    volumeL,
    meanSugarPct: volumeL > 0 ? sugarVolume / volumeL : null,
    expectedSyrupL: jones,
    expectedSyrupLRevised: revised,
    syrupMadeL: made,
    entriesWithSyrup: withSyrup,
    expectedSyrupLWhereMade: withSyrup > 0 ? expectedWhereMade : null,
    yieldPerTapL: taps > 0 ? volumeL / taps : null,
  };
}

/** US liquid gallon = 231 in³ = 3.785411784 L exactly (NIST Handbook 44). */
export const L_PER_US_GAL = 3.785411784;
export const galToL = (gal: number) => gal * L_PER_US_GAL;
export const lToGal = (litres: number) => litres / L_PER_US_GAL;
