import { z } from 'zod';
import { roleSchema } from './enums';

export const loginSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  password: z.string().min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const registerSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  name: z.string().trim().min(1, 'Enter your name').max(120),
  password: z.string().min(10, 'Use at least 10 characters').max(200),
});
export type RegisterInput = z.infer<typeof registerSchema>;

export interface PublicUser {
  id: number;
  email: string;
  name: string;
  unitSystem: 'imperial' | 'metric';
}

export const membershipSchema = z.object({ sugarbushId: z.number().int(), role: roleSchema });
export type Membership = z.infer<typeof membershipSchema>;

export interface MeResponse {
  user: PublicUser;
  memberships: Membership[];
}
