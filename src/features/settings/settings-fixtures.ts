import type { GuidelinePreview, TreeTapChange } from '@shared/schemas/guideline-preview';
import type { Invitation } from '@shared/schemas/invitation';
import type { Member } from '@shared/schemas/members';

/** Test data for the settings page: an invented team on the stand of `src/test/fixtures.ts`. */

export const member = (overrides: Partial<Member> = {}): Member => ({
  userId: 11,
  name: 'Pat owner',
  email: 'owner@example.test',
  role: 'owner',
  since: '2024-05-02T09:00:00Z',
  ...overrides,
});

export const team = (): Member[] => [
  member(),
  member({ userId: 12, name: 'Robin Ash', email: 'robin@example.test', role: 'forester' }),
  member({ userId: 13, name: 'Sam Birch', email: 'sam@example.test', role: 'tapper' }),
];

export const invitation = (overrides: Partial<Invitation> = {}): Invitation => ({
  id: 5,
  email: 'lee@example.test',
  role: 'tapper',
  status: 'pending',
  invitedBy: { userId: 11, name: 'Pat owner' },
  createdAt: '2027-01-04T10:00:00Z',
  expiresAt: '2027-01-11T10:00:00Z',
  ...overrides,
});

export const tapChange = (overrides: Partial<TreeTapChange> = {}): TreeTapChange => ({
  treeId: 21,
  tag: 'HC-0021',
  dbhCm: 53.3,
  fromTaps: 2,
  toTaps: 3,
  fromVerdict: 'tap',
  toVerdict: 'tap',
  ...overrides,
});

export const guidelinePreview = (overrides: Partial<GuidelinePreview> = {}): GuidelinePreview => ({
  season: 2027,
  from: { profile: 'conservative', label: 'Conservative', taps: 1412, tappedTrees: 905 },
  to: { profile: 'traditional', label: 'Traditional', taps: 1876, tappedTrees: 1004 },
  tapsAdded: 501,
  tapsRemoved: 37,
  treesChanged: 388,
  treesBecomeTooSmall: 0,
  changes: [
    tapChange(),
    tapChange({
      treeId: 22,
      tag: 'HC-0022',
      dbhCm: 26.1,
      fromTaps: 0,
      toTaps: 1,
      fromVerdict: 'too-small',
    }),
  ],
  changesTotal: 388,
  ...overrides,
});
