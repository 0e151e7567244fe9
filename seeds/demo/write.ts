import type { Knex } from 'knex';
import type { Role } from '../../shared/schemas/enums';
import type { StandPlan } from './demo';
import { insertInBatches, stamp } from './insert';
import { DEMO_USERS } from './people';
import type { TreePlan } from './types';

const USERS_CREATED = '2018-08-28 10:00:00';

/** When and why a tree's register status changed, for the audit trail and `updated_at`. */
function statusChange(p: TreePlan): string | null {
  switch (p.spec.status) {
    case 'dead':
      return stamp(p.measurements.find((m) => m.crownDiebackPct === 100)!.measuredOn, '17:20:00');
    case 'removed':
      return p.spec.removedOn;
    case 'held-out':
      return '2023-12-05 09:10:00';
    default:
      return null;
  }
}

async function writeStand(
  trx: Knex.Transaction,
  stand: StandPlan,
  userIds: Map<string, number>,
): Promise<void> {
  const members = DEMO_USERS.filter((u) => u.sugarbush === stand.name);
  const who = (...roles: Role[]) => {
    for (const role of roles) {
      const u = members.find((m) => m.role === role);
      if (u) return userIds.get(u.email)!;
    }
    throw new Error(`${stand.name} has none of ${roles.join(', ')}`);
  };

  await trx('sugarbushes').insert({
    name: stand.name,
    boundary: stand.boundary,
    profile: stand.profile,
    sunny_azimuth_deg: stand.sunnyAzimuthDeg,
    created_at: stand.createdAt,
    updated_at: stand.createdAt,
  });
  const { id: sugarbushId } = await trx('sugarbushes').where({ name: stand.name }).first('id');
  await insertInBatches(
    trx,
    'memberships',
    members.map((u) => ({
      user_id: userIds.get(u.email),
      sugarbush_id: sugarbushId,
      role: u.role,
      created_at: stand.createdAt,
    })),
  );

  const treeCreated = stamp(`${stand.layout.firstSeason}-09-20`, '13:00:00');
  await insertInBatches(
    trx,
    'trees',
    stand.trees.map((p) => ({
      sugarbush_id: sugarbushId,
      tag: p.spec.tag,
      species: p.spec.species,
      lat: p.lat,
      lng: p.lng,
      status: p.spec.status,
      created_at: treeCreated,
      updated_at: statusChange(p) ?? treeCreated,
    })),
  );
  const treeIds = new Map<string, number>(
    (await trx('trees').where({ sugarbush_id: sugarbushId }).select('id', 'tag')).map(
      (r: { id: number; tag: string }) => [r.tag, r.id],
    ),
  );

  const forester = who('forester', 'owner');
  await insertInBatches(
    trx,
    'measurements',
    stand.trees.flatMap((p) =>
      p.measurements.map((m) => ({
        tree_id: treeIds.get(p.spec.tag),
        measured_on: m.measuredOn,
        season: m.season,
        dbh_cm: m.dbhCm,
        crown_dieback_pct: m.crownDiebackPct,
        note: m.note,
        confirmed_outlier: m.confirmedOutlier,
        recorded_by: forester,
        created_at: stamp(m.measuredOn, '16:30:00'),
      })),
    ),
  );

  const tapper = who('tapper', 'owner');
  await insertInBatches(
    trx,
    'tapholes',
    stand.trees.flatMap((p) =>
      p.tapholes.map((t) => ({
        tree_id: treeIds.get(p.spec.tag),
        season: t.season,
        height_cm: t.heightCm,
        azimuth_deg: t.azimuthDeg,
        depth_cm: t.depthCm,
        bit_cm: t.bitCm,
        collection: t.collection,
        drilled_on: t.drilledOn,
        stain_hit: t.stainHit,
        recorded_by: tapper,
        created_at: stamp(t.drilledOn, '17:45:00'),
      })),
    ),
  );

  const author = who('consultant', 'owner');
  await insertInBatches(
    trx,
    'notes',
    stand.notes.map((n) => ({
      sugarbush_id: sugarbushId,
      tree_id: n.tag === null ? null : treeIds.get(n.tag),
      author_id: author,
      category: n.category,
      body: n.body,
      follow_up_on: n.followUpOn,
      created_at: n.createdAt,
    })),
  );

  await insertInBatches(
    trx,
    'weather_days',
    stand.seasonLog.weather.map((d) => ({
      sugarbush_id: sugarbushId,
      date: d.date,
      min_c: d.minC,
      max_c: d.maxC,
      source: d.source,
      station: d.station,
      recorded_by: forester,
      created_at: stamp(d.date, '20:15:00'),
      updated_at: stamp(d.date, '20:15:00'),
    })),
  );
  await insertInBatches(
    trx,
    'sap_entries',
    stand.seasonLog.sap.map((e) => ({
      sugarbush_id: sugarbushId,
      collected_on: e.collectedOn,
      season: Number(e.collectedOn.slice(0, 4)),
      volume_l: e.volumeL,
      sugar_pct: e.sugarPct,
      held_at_c: e.heldAtC,
      collection: e.collection,
      syrup_made_l: e.syrupMadeL,
      note: e.note,
      recorded_by: tapper,
      created_at: stamp(e.collectedOn, '18:40:00'),
      updated_at: stamp(e.collectedOn, '18:40:00'),
    })),
  );

  const owner = who('owner');
  await insertInBatches(trx, 'audit_events', [
    {
      sugarbush_id: sugarbushId,
      user_id: owner,
      action: 'create',
      entity: 'sugarbush',
      entity_id: sugarbushId,
      detail: null,
      created_at: stand.createdAt,
    },
    ...stand.trees.flatMap((p) => {
      const at = statusChange(p);
      if (!at) return [];
      return [
        {
          sugarbush_id: sugarbushId,
          user_id: forester,
          action: 'update',
          entity: 'tree',
          entity_id: treeIds.get(p.spec.tag),
          detail: JSON.stringify({ status: p.spec.status }),
          created_at: at,
        },
      ];
    }),
  ]);
}

/** Writes the demo into an empty database, inside the caller's transaction. */
export async function writeDemo(
  trx: Knex.Transaction,
  stands: StandPlan[],
  passwordHashes: readonly string[],
): Promise<void> {
  const [{ n }] = await trx('users').count({ n: '*' });
  if (Number(n) > 0) throw new Error('The demo seed expects an empty database (users exist).');
  await insertInBatches(
    trx,
    'users',
    DEMO_USERS.map((u, i) => ({
      email: u.email,
      name: u.name,
      password_hash: passwordHashes[i],
      unit_system: u.unitSystem,
      created_at: USERS_CREATED,
    })),
  );
  const userIds = new Map<string, number>(
    (await trx('users').select('id', 'email')).map((r: { id: number; email: string }) => [
      r.email,
      r.id,
    ]),
  );
  for (const stand of stands) await writeStand(trx, stand, userIds);
}
