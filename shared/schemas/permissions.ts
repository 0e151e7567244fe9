import type { Role } from './enums';

/** What each role may do inside one sugarbush. Read access is every member's. */
export const permissions = {
  'edit-trees': ['owner', 'forester'],
  'record-measurements': ['owner', 'forester'],
  'record-tapholes': ['owner', 'tapper'],
  'write-notes': ['owner', 'consultant'],
  'manage-stand': ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissions;

export function can(role: Role | null | undefined, action: Permission): boolean {
  return !!role && (permissions[action] as readonly Role[]).includes(role);
}
