import type { Knex } from 'knex';
import { AppError } from '../../errors';
import { isUniqueViolation } from '../../lib/db-engine';

/** A tree that is dead or removed takes no new readings or holes (history is kept as it is). */
const retiredStatuses = new Set(['dead', 'removed']);

export async function refuseRetiredTree(db: Knex, treeId: number): Promise<void> {
  const tree = await db('trees').where({ id: treeId }).first('tag', 'status');
  if (tree && retiredStatuses.has(tree.status)) {
    throw new AppError(
      409,
      'tree-retired',
      `Tree ${tree.tag} is marked ${tree.status}: it takes no new readings or tapholes`,
    );
  }
}

export interface StoreOnce<T> {
  clientId: string | undefined;
  /** The entry already stored under this client id, if any. */
  find: (clientId: string) => Promise<T | undefined>;
  /** Whether a stored entry is the one being sent (same tree, same content). */
  matches: (stored: T) => boolean;
  /** Checks that only a new entry needs (the tree's status, the reading's plausibility). */
  check: () => Promise<void>;
  /** Writes the entry with everything that goes with it (audit, advice), in one transaction. */
  create: () => Promise<T>;
}

/**
 * Stores an entry sent from the field once: a resend with the same client id answers with the
 * stored entry and writes nothing; the same id on a different tree or content is a 409. Two sends
 * racing each other are told apart by the unique index on `client_id`.
 */
export async function storeOnce<T>(opts: StoreOnce<T>): Promise<{ entry: T; created: boolean }> {
  const { clientId } = opts;
  const resent = (stored: T) => {
    if (!opts.matches(stored)) {
      throw new AppError(
        409,
        'client-id-conflict',
        'This entry id was already used for a different entry: record it again as a new entry',
      );
    }
    return { entry: stored, created: false };
  };
  if (clientId) {
    const prior = await opts.find(clientId);
    if (prior) return resent(prior);
  }
  await opts.check();
  try {
    return { entry: await opts.create(), created: true };
  } catch (err) {
    if (clientId && isUniqueViolation(err)) {
      const prior = await opts.find(clientId);
      if (prior) return resent(prior);
    }
    throw err;
  }
}
