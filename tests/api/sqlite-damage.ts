import fs from 'node:fs';
import Database from 'better-sqlite3';

/** A SQLite varint at `at`: its value and its length in bytes (1 to 9). */
function varint(buf: Buffer, at: number): [value: number, length: number] {
  let value = 0;
  for (let i = 0; i < 8; i++) {
    const b = buf[at + i];
    value = value * 128 + (b & 0x7f);
    if ((b & 0x80) === 0) return [value, i + 1];
  }
  return [value * 256 + buf[at + 8], 9];
}

/**
 * Spoil one entry of one index of `table` in a SQLite file, leaving the file's structure and
 * every table's own rows as they were: the last byte of the last entry on one of the index's
 * leaf pages (its row's id, or the end of its key) is changed. The file still opens and answers;
 * only `PRAGMA integrity_check` can tell. Returns the index's name and the page changed.
 */
export function damageOneIndexEntry(file: string, table: string): { index: string; page: number } {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  let leaf: { name: string; pageno: number } | undefined;
  let pageSize: number;
  try {
    pageSize = db.pragma('page_size', { simple: true }) as number;
    leaf = db
      .prepare(
        `select s.name, s.pageno from dbstat s join sqlite_master m on m.name = s.name
         where m.type = 'index' and m.tbl_name = ? and s.pagetype = 'leaf' and s.ncell > 1
         order by s.ncell desc, s.pageno limit 1`,
      )
      .get(table) as typeof leaf;
  } finally {
    db.close();
  }
  if (!leaf) throw new Error(`${table} has no index with a leaf page of several entries`);
  const buf = fs.readFileSync(file);
  const page = (leaf.pageno - 1) * pageSize;
  // An index leaf page: type 0x0a, then the cell count at +3 and the cell pointers from +8.
  if (buf[page] !== 0x0a) throw new Error(`page ${leaf.pageno} is not an index leaf`);
  const cells = buf.readUInt16BE(page + 3);
  const cell = page + buf.readUInt16BE(page + 8 + 2 * (cells - 1));
  const [payload, headerLength] = varint(buf, cell);
  // The most an index entry keeps on its page before the rest overflows (SQLite's file format).
  const maxLocal = Math.floor(((pageSize - 12) * 64) / 255) - 23;
  if (payload > maxLocal) throw new Error('the entry overflows its page');
  buf[cell + headerLength + payload - 1] ^= 0x01;
  fs.writeFileSync(file, buf);
  return { index: leaf.name, page: leaf.pageno };
}
