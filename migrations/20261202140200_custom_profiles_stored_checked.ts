import type { Knex } from 'knex';
import { validateCustomProfile } from '../shared/rules/index';

/**
 * Custom profiles were stored as sent, unknown fields and all. Each one that passes the
 * advisor's check is stored again as checked (defaults filled in, nothing else kept); one that
 * does not is left for the owner to fix in Settings, where the plan points them.
 */
export async function up(knex: Knex): Promise<void> {
  const rows: { id: number; custom_profile: string }[] = await knex('sugarbushes')
    .whereNotNull('custom_profile')
    .select('id', 'custom_profile');
  for (const row of rows) {
    let stored: unknown;
    try {
      stored = JSON.parse(row.custom_profile);
    } catch {
      continue;
    }
    const result = validateCustomProfile(stored);
    if (result.ok)
      await knex('sugarbushes')
        .where({ id: row.id })
        .update({ custom_profile: JSON.stringify(result.value) });
  }
}

export async function down(): Promise<void> {
  // What was stored before cannot be recovered; the checked form is a valid profile either way.
}
