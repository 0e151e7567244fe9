import Database from 'better-sqlite3';

/** A write the server answered as done, and when its answer arrived. */
export interface AckedWrite {
  kind: 'measurement' | 'import';
  /** The measurement's note, or the tag prefix every tree of the import starts with. */
  key: string;
  at: number;
}

export const TREES_PER_IMPORT = 10;

/** A CSV of new trees whose tags all start with `prefix`. */
export function treesCsv(prefix: string, count = TREES_PER_IMPORT, lat = 45.1) {
  const lines = ['tag,species,lat,lng,status'];
  for (let i = 1; i <= count; i++)
    lines.push(
      `${prefix}${String(i).padStart(5, '0')},sugar-maple,${(lat + i * 1e-5).toFixed(6)},-72.5,active`,
    );
  return Buffer.from(`${lines.join('\n')}\n`, 'utf8');
}

/**
 * What a crash or a backup must never break, read straight from a database file: SQLite's own
 * check; every acknowledged write present; every measurement with its audit entry and the
 * reverse; each import all there or not at all, and one audit entry per import that is there.
 */
export function checkConsistent(
  file: string,
  opts: { acked: AckedWrite[]; prefixes: string[]; perImport?: number[] },
) {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const integrity = (db.pragma('integrity_check') as { integrity_check: string }[]).map(
      (r) => r.integrity_check,
    );
    const notes = new Set(
      (db.prepare('select note from measurements').all() as { note: string | null }[]).map(
        (r) => r.note,
      ),
    );
    const orphanMeasurements = db
      .prepare(
        `select count(*) as n from measurements m where not exists (select 1 from audit_events e
         where e.entity = 'measurement' and e.entity_id = m.id)`,
      )
      .get() as { n: number };
    const orphanAudits = db
      .prepare(
        `select count(*) as n from audit_events e where e.entity = 'measurement' and e.entity_id is not null and not exists
         (select 1 from measurements m where m.id = e.entity_id)`,
      )
      .get() as { n: number };
    const treesOf = db.prepare('select count(*) as n from trees where tag like ?');
    const imported = opts.prefixes.map((p) => (treesOf.get(`${p}%`) as { n: number }).n);
    const importAudits = (
      db
        .prepare(
          "select count(*) as n from audit_events where entity = 'tree' and action = 'import'",
        )
        .get() as { n: number }
    ).n;
    const missing = opts.acked.filter((w) =>
      w.kind === 'measurement' ? !notes.has(w.key) : imported[opts.prefixes.indexOf(w.key)] === 0,
    );
    const perImport = opts.perImport ?? opts.prefixes.map(() => TREES_PER_IMPORT);
    return {
      integrity,
      missing,
      orphanMeasurements: orphanMeasurements.n,
      orphanAudits: orphanAudits.n,
      /** Imports neither wholly present nor wholly absent. */
      partialImports: opts.prefixes.filter(
        (_p, i) => imported[i] !== 0 && imported[i] !== perImport[i],
      ),
      importsPresent: imported.filter((n) => n > 0).length,
      importAudits,
      measurements: notes.size,
    };
  } finally {
    db.close();
  }
}
