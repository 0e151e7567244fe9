import type { Role } from '@shared/schemas/enums';
import type { SectionKey } from '@/config/paths';
import type { Permission } from '@/lib/auth';

export interface Section {
  key: SectionKey;
  label: string;
  /** For the phone's bottom bar, where room is short. */
  shortLabel: string;
  /** Who sees the section: a member holding this permission. */
  permission: Permission;
  /** One line on what the section is for. */
  summary: string;
}

export const sections: readonly Section[] = [
  {
    key: 'trees',
    label: 'Trees',
    shortLabel: 'Trees',
    permission: 'read',
    summary: 'Every tagged tree, its DBH and its status.',
  },
  {
    key: 'map',
    label: 'Map',
    shortLabel: 'Map',
    permission: 'read',
    summary: 'The stand on a map, each tree marked with its advice for the season.',
  },
  {
    key: 'round',
    label: 'Measuring round',
    shortLabel: 'Round',
    permission: 'record-measurements',
    summary: 'Walk the stand tree by tree and record DBH and crown dieback as you go.',
  },
  {
    key: 'plan',
    label: 'Season plan',
    shortLabel: 'Plan',
    permission: 'read',
    summary: 'How many taps each tree takes this season, and where, as a field sheet.',
  },
  {
    key: 'overview',
    label: 'Overview',
    shortLabel: 'Overview',
    permission: 'read',
    summary: 'Stand figures season by season, and how the tapping compares with a guideline.',
  },
  {
    key: 'notes',
    label: 'Notes',
    shortLabel: 'Notes',
    permission: 'read',
    summary: 'Trees that need a look, and notes and photos on the stand and its trees.',
  },
  {
    key: 'season',
    label: 'Season log',
    shortLabel: 'Log',
    permission: 'read',
    summary: 'Weather, sap and syrup day by day: when the sap ran and what it should make.',
  },
  {
    key: 'settings',
    label: 'Settings',
    shortLabel: 'Settings',
    permission: 'read',
    summary:
      "The stand's name and sunny side, the tapping guideline, and the team and their roles.",
  },
];

export const sectionByKey = (key: SectionKey): Section =>
  sections.find((s) => s.key === key) as Section;

/** The four sections each role reaches for most; the rest sit behind "More" on a phone. */
export const phonePriority: Record<Role, readonly SectionKey[]> = {
  owner: ['trees', 'map', 'plan', 'overview'],
  forester: ['trees', 'map', 'round', 'plan'],
  tapper: ['trees', 'map', 'season', 'plan'],
  consultant: ['trees', 'map', 'notes', 'overview'],
};

/** Route `handle` that names the section a page belongs to. */
export interface SectionHandle {
  section: SectionKey;
}
