/**
 * The crew of the mixed load run: invented accounts added to the stand's copy before the server
 * starts (owners, foresters, tappers, as a large sugarbush's team would be), then each signed in
 * over HTTP with a session and a CSRF token of its own.
 */
import Database from 'better-sqlite3';
import type { Role } from '../../shared/schemas/enums';
import { hashPassword } from '../../server/modules/auth/password';
import { signIn, type Session } from './http';
import { BENCH_OWNER } from './synthetic-stand';

export interface CrewMember {
  email: string;
  password: string;
  role: Role;
}

/** How many of each role: the stand's owner and four partners, fifteen foresters, thirty tappers. */
export const CREW_SIZES = { owner: 5, forester: 15, tapper: 30 } as const;
const CREW_PASSWORD = 'sap-run-crew-2027';

export function crewList(): CrewMember[] {
  const crew: CrewMember[] = [{ ...BENCH_OWNER, role: 'owner' }];
  for (const [role, count] of Object.entries(CREW_SIZES) as [Role, number][]) {
    for (let i = crew.filter((c) => c.role === role).length; i < count; i++)
      crew.push({
        email: `bench-${role}-${String(i + 1).padStart(2, '0')}@stand.example`,
        password: CREW_PASSWORD,
        role,
      });
  }
  return crew;
}

/**
 * Write the crew's accounts and memberships into a database file the server has not opened yet
 * (the bench's own copy). The stand's owner is already there; the others share one password.
 */
export async function addCrew(dbFile: string, standId: number, crew: readonly CrewMember[]) {
  const hash = await hashPassword(CREW_PASSWORD);
  const sqlite = new Database(dbFile);
  try {
    const user = sqlite.prepare(
      'insert into users (email, name, password_hash, unit_system) values (?, ?, ?, ?)',
    );
    const member = sqlite.prepare(
      'insert into memberships (user_id, sugarbush_id, role) values (?, ?, ?)',
    );
    sqlite.transaction(() => {
      for (const c of crew) {
        if (c.email === BENCH_OWNER.email) continue;
        const name = c.email.split('@')[0].replace(/^bench-/, 'Bench ');
        const id = Number(user.run(c.email, name, hash, 'metric').lastInsertRowid);
        member.run(id, standId, c.role);
      }
    })();
  } finally {
    sqlite.close();
  }
}

/** Sign each member in, one after another (each sign-in hashes a password on the server). */
export async function signInCrew(baseUrl: string, crew: readonly CrewMember[]) {
  const out: (CrewMember & { session: Session })[] = [];
  for (const c of crew) out.push({ ...c, session: await signIn(baseUrl, c.email, c.password) });
  return out;
}
