import type { Knex } from 'knex';

/**
 * The profile key `quebec-public` used to mean Quebec's 2004 public-land table (A-18.1 r.2:
 * 20/40/60/80 cm for one to four taps), replaced on 2018-08-16 by r.8.1. The key now
 * means the rule in force. Stands that were on the old table move to it with a notice the owner
 * sees on the season plan until they choose a guideline again.
 */
export const QUEBEC_PUBLIC_NOTICE =
  'This stand followed Quebec’s 2004 public-land table (A-18.1 r.2: 20, 40, 60 and 80 cm for one to four taps), replaced on 2018-08-16. Clearwood now plans it by the rule in force, A-18.1 r.8.1 s.24: one tap from 23.1 cm, two from 39.1 cm, at most two. Check the plan, then choose the guideline again in Settings to dismiss this notice.';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sugarbushes', (t) => {
    t.text('profile_notice');
  });
  await knex('sugarbushes')
    .where({ profile: 'quebec-public' })
    .update({ profile_notice: QUEBEC_PUBLIC_NOTICE });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sugarbushes', (t) => {
    t.dropColumn('profile_notice');
  });
}
