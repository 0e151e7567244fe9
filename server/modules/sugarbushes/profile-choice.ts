import { AppError } from '../../errors';
import { isProfileKey, profileKeys, validateCustomProfile } from '../../../shared/rules/index';

/**
 * The guideline profile columns for a change of profile: a published set by key, or `custom`
 * with a custom set that passes the advisor's own validation. Throws 400 with field errors.
 */
export function profileColumns(
  patch: { profile?: string; customProfile?: unknown },
  current: { profile: string; customProfile: unknown },
): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  if (patch.customProfile !== undefined) {
    const result = validateCustomProfile(patch.customProfile);
    if (!result.ok) {
      const fields = Object.fromEntries(
        result.errors.map((e) => [`customProfile${e.path ? `.${e.path}` : ''}`, e.message]),
      );
      throw new AppError(400, 'invalid-input', 'The custom profile needs attention', fields);
    }
    // The checked set, never the body as sent.
    row.custom_profile = JSON.stringify(result.value);
  }
  const profile = patch.profile;
  if (profile !== undefined) {
    if (profile === 'custom') {
      if (patch.customProfile === undefined && !current.customProfile) {
        throw new AppError(400, 'invalid-input', 'Save a custom profile before choosing it', {
          customProfile: 'Give the custom profile’s bands, spacing and height band',
        });
      }
    } else if (!isProfileKey(profile)) {
      throw new AppError(400, 'invalid-input', 'Unknown guideline profile', {
        profile: `Choose one of ${[...profileKeys, 'custom'].join(', ')}`,
      });
    }
    row.profile = profile;
    // Choosing a guideline dismisses the notice that the stand's old rule was replaced.
    row.profile_notice = null;
  }
  return row;
}
