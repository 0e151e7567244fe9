import type { Knex } from 'knex';
import type { PublicUser } from '../../../shared/schemas/auth';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  unit_system: 'imperial' | 'metric';
}

export const toPublicUser = (r: UserRow): PublicUser => ({
  id: r.id,
  email: r.email,
  name: r.name,
  unitSystem: r.unit_system,
});

export function usersRepository(db: Knex) {
  return {
    findByEmail: (email: string) =>
      db<UserRow>('users').where({ email: email.toLowerCase() }).first(),
    findById: (id: number) => db<UserRow>('users').where({ id }).first(),
    async create(u: { email: string; name: string; passwordHash: string }): Promise<number> {
      const [row] = await db('users')
        .insert({ email: u.email.toLowerCase(), name: u.name, password_hash: u.passwordHash })
        .returning('id');
      return typeof row === 'object' ? row.id : row;
    },
    setPassword: (id: number, passwordHash: string) =>
      db('users').where({ id }).update({ password_hash: passwordHash }),
  };
}
