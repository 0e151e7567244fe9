import type { Knex } from 'knex';
import { AppError } from '../../errors';
import {
  resolveProfile,
  validateCustomProfile,
  type GuidelineProfile,
} from '../../../shared/rules/index';

export interface StandGuideline {
  profile: GuidelineProfile;
  sunnyAzimuthDeg: number;
  /** Bumped by every change of guideline or sunny side: stored advice names the one it used. */
  adviceVersion: number;
}

/** The guideline a stand's columns name; a saved custom set that no longer passes is a 409. */
export function profileOf(key: string, customJson: string | null): GuidelineProfile {
  if (key !== 'custom') return resolveProfile(key);
  const result = validateCustomProfile(customJson ? JSON.parse(customJson) : null);
  if (!result.ok)
    throw new AppError(
      409,
      'profile-invalid',
      'The saved custom profile is not valid: fix it in Settings',
    );
  return result.profile;
}

/** What the advisor needs of the stand, read in one row. */
export async function standGuideline(db: Knex, sugarbushId: number): Promise<StandGuideline> {
  const row = await db('sugarbushes')
    .where({ id: sugarbushId })
    .first('profile', 'custom_profile', 'sunny_azimuth_deg', 'advice_version');
  if (!row) throw new AppError(404, 'not-found', 'Sugarbush not found');
  return {
    profile: profileOf(row.profile, row.custom_profile),
    sunnyAzimuthDeg: Number(row.sunny_azimuth_deg),
    adviceVersion: Number(row.advice_version),
  };
}
