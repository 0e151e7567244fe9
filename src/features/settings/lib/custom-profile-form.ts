import { z } from 'zod';
import {
  customProfileSchema,
  isProfileKey,
  profiles,
  type CustomProfileInput,
  type GuidelineProfile,
} from '@shared/rules/index';
import { collections } from '@shared/schemas/enums';
import { collectionLabels } from '@/lib/collection-labels';

/** The editor's values: the custom set under the name the API's field errors use. */
export const customProfileFormSchema = z.object({ customProfile: customProfileSchema });
export type CustomProfileForm = z.input<typeof customProfileFormSchema>;
export type CustomProfileFormOutput = z.output<typeof customProfileFormSchema>;

export const CUSTOM_PROFILE_KEY = 'custom';

/** A published set written out as a custom one, for the owner to change from there. */
export function customFromProfile(profile: GuidelineProfile): CustomProfileInput {
  return {
    key: CUSTOM_PROFILE_KEY,
    label: 'Our own guideline',
    unit: profile.unit,
    bands: profile.bands.map((b) => ({
      from: b.from,
      taps: b.taps,
      ...(b.fullOnlyForHealthyFastGrowers ? { fullOnlyForHealthyFastGrowers: true } : {}),
    })),
    spacing: { ...profile.spacing },
    heightBand: { ...profile.heightBand },
    drill: {
      bucket: { ...profile.drill.bucket },
      gravity: { ...profile.drill.gravity },
      vacuum: { ...profile.drill.vacuum },
    },
    limits: { ...profile.limits },
    stressed: { ...profile.stressed },
    zone: { ...profile.zone },
    source: `Adapted from ${profile.label}`.slice(0, 300),
  };
}

/** The stand's saved custom set when it still reads as one; else the guideline in use, written out. */
export function initialCustomProfile(stand: {
  profile: string;
  customProfile: unknown;
}): CustomProfileInput {
  const saved = customProfileSchema.safeParse(stand.customProfile);
  if (saved.success) return saved.data;
  return customFromProfile(
    isProfileKey(stand.profile) ? profiles[stand.profile] : profiles.conservative,
  );
}

/** How a number is typed: a length in the user's unit, a share as %, a percentage, a count. */
export type NumberKind = 'length' | 'bit' | 'share' | 'percent' | 'count';

export interface NumberFieldSpec {
  /** Path inside the custom set, as the schema and the API's field errors name it. */
  path: string;
  label: string;
  kind: NumberKind;
  hint?: string;
}

export interface FieldGroupSpec {
  legend: string;
  hint?: string;
  fields: NumberFieldSpec[];
}

const drillFields = collections.flatMap((c): NumberFieldSpec[] => [
  {
    path: `drill.${c}.depthCm`,
    label: `${collectionLabels[c]}: depth`,
    kind: 'length',
    hint: 'Including bark',
  },
  { path: `drill.${c}.bitCm`, label: `${collectionLabels[c]}: bit`, kind: 'bit' },
]);

/** The groups shown at once: where holes go and how they are drilled. */
export const mainGroups: FieldGroupSpec[] = [
  {
    legend: 'Spacing from earlier holes',
    hint: 'A new hole is clear of an earlier one still in reach with either distance between them.',
    fields: [
      { path: 'spacing.sidewaysCm', label: 'Sideways, around the trunk', kind: 'length' },
      { path: 'spacing.verticalCm', label: 'Above or below', kind: 'length' },
    ],
  },
  {
    legend: 'Height band',
    hint: 'Where tapholes go, measured from the ground.',
    fields: [
      { path: 'heightBand.minCm', label: 'Lowest hole', kind: 'length' },
      { path: 'heightBand.maxCm', label: 'Highest hole', kind: 'length' },
    ],
  },
  { legend: 'Drilling', fields: drillFields },
];

/** The groups behind "More figures": limits, stressed trees and the tapping-zone model. */
export const moreGroups: FieldGroupSpec[] = [
  {
    legend: 'Limits',
    fields: [
      { path: 'limits.maxDepthCm', label: 'Deepest hole allowed', kind: 'length' },
      { path: 'limits.maxBitCm', label: 'Widest bit allowed', kind: 'bit' },
    ],
  },
  {
    legend: 'Stressed trees',
    fields: [
      { path: 'stressed.maxTaps', label: 'Most taps on a stressed tree', kind: 'count' },
      { path: 'stressed.noneBelowCm', label: 'No taps on a stressed tree under', kind: 'length' },
      { path: 'stressed.diebackPct', label: 'Crown dieback that marks stress', kind: 'percent' },
      {
        path: 'stressed.restAtDiebackPct',
        label: 'Crown dieback that rests a tree',
        kind: 'percent',
      },
    ],
  },
  {
    legend: 'Tapping zone',
    hint: 'The wood a new hole can reach. When less of it is clear than the clear-wood floor, the advisor rests the tree.',
    fields: [
      { path: 'zone.barkCm', label: 'Bark thickness', kind: 'length' },
      { path: 'zone.stainLengthCm', label: 'Stain column length', kind: 'length' },
      { path: 'zone.stainMarginCm', label: 'Stain margin', kind: 'length' },
      { path: 'zone.zoneHeightCm', label: 'Zone height', kind: 'length' },
      { path: 'zone.floor', label: 'Clear-wood floor', kind: 'share' },
    ],
  },
];

export const formPath = (path: string) => `customProfile.${path}`;

/** Every field the editor shows, for placing the API's field errors. */
export function editorFieldPaths(bandCount: number): string[] {
  const bands = Array.from({ length: bandCount }, (_, i) =>
    ['from', 'taps', 'fullOnlyForHealthyFastGrowers'].map((f) => `bands.${i}.${f}`),
  ).flat();
  return ['label', 'unit', 'source', 'bands', ...bands]
    .concat([...mainGroups, ...moreGroups].flatMap((g) => g.fields.map((f) => f.path)))
    .map(formPath);
}
