/**
 * The mixed load section of a stand: its crew written into the stand's copy before the server
 * starts, then (the server answering) a season log typed in, the crew signed in, and the floor
 * and mixed runs.
 */
import { addCrew, crewList, signInCrew, type CrewMember } from './mixed-roster';
import { mixedLoad, seedSeasonLog, type MixedFigures } from './mixed-load';
import { treePool } from './mixed-actions';
import type { Session } from './http';
import { settle } from './stand-bench';

const POOL_TREES = 2000;

/** Before the server opens `dbFile`: the crew's accounts and memberships. */
export async function prepareCrew(dbFile: string, standId: number): Promise<CrewMember[]> {
  const crew = crewList();
  await addCrew(dbFile, standId, crew);
  return crew;
}

export async function mixedSection(opts: {
  baseUrl: string;
  owner: Session;
  crew: readonly CrewMember[];
  /** The stand's file as generated (read for the trees and their latest DBH). */
  standFile: string;
  standId: number;
  season: number;
}): Promise<MixedFigures> {
  const logSeason = opts.season - 1;
  const seeded = await seedSeasonLog(opts.owner, opts.standId, logSeason);
  const users = await signInCrew(opts.baseUrl, opts.crew);
  const trees = treePool(opts.standFile, opts.standId, POOL_TREES);
  await settle(opts.owner);
  return mixedLoad(users, { standId: opts.standId, season: opts.season, logSeason, trees }, seeded);
}
