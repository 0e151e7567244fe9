import type { Role } from './enums';

/**
 * What each role may do inside one sugarbush: the one table every server check and every client
 * control names. Reading the stand, its trees, map, advice, plan and team is every member's.
 */
export const permissions = {
  'edit-trees': ['owner', 'forester'],
  'edit-boundary': ['owner', 'forester'],
  'upload-basemaps': ['owner', 'forester'],
  'record-measurements': ['owner', 'forester'],
  'record-tapholes': ['owner', 'tapper'],
  'write-notes': ['owner', 'consultant'],
  /** The stand's name and its sunny side. */
  'manage-stand': ['owner'],
  'choose-guideline': ['owner'],
  /** The team: roles, removal, invitations. */
  'manage-members': ['owner'],
  /** Who recorded, corrected or changed what in the stand, and when. */
  'read-audit': ['owner'],
  /** Freeze a season's plan as the copy the crew works from. */
  'issue-plan': ['owner'],
  /** The season log: sap collected, syrup made, the weather by day. */
  'record-season-log': ['owner', 'forester', 'tapper'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissions;

export const permissionLabels: Record<Permission, string> = {
  'edit-trees': 'Add and edit trees',
  'edit-boundary': 'Draw or import the stand boundary',
  'upload-basemaps': 'Upload map backgrounds',
  'record-measurements': 'Record DBH and crown ratings',
  'record-tapholes': 'Record tapholes',
  'write-notes': 'Write notes',
  'manage-stand': 'Rename the stand and set its sunny side',
  'choose-guideline': 'Choose the tapping guideline',
  'manage-members': 'Invite people, change roles, remove members',
  'read-audit': 'Read the record of who changed what',
  'issue-plan': 'Issue the season’s plan to the crew',
  'record-season-log': 'Record sap and weather',
};

export function can(role: Role | null | undefined, action: Permission): boolean {
  return !!role && (permissions[action] as readonly Role[]).includes(role);
}
