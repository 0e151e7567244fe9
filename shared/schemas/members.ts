import { z } from 'zod';
import { roleSchema, type Role } from './enums';

/** One person on a stand's team (`GET /api/sugarbushes/:id/members`, a page of these). */
export interface Member {
  userId: number;
  name: string;
  email: string;
  role: Role;
  /** When they joined, ISO. */
  since: string;
}

/** `PATCH /api/sugarbushes/:id/members/:userId` → the `Member`; demoting the last owner is 409. */
export const memberPatchSchema = z.object({ role: roleSchema });
export type MemberPatch = z.infer<typeof memberPatchSchema>;
