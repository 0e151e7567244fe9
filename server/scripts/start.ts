import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEMO_PASSWORD, DEMO_USERS } from '../../seeds/01_demo';
import { exitOnConfigError, startServer } from '../index';
import { loadConfig } from '../config';
import { describeDb, migrateLatest, openDb } from '../db';
import { seedDemoIfEmpty } from './seed-demo';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** `npm start`: migrate, seed the demo into an empty database, build the client if needed, serve. */
async function main() {
  const config = loadConfig();
  if (config.SEED_DEMO) {
    const db = openDb(config.database);
    await migrateLatest(db);
    if (await seedDemoIfEmpty(db)) console.log('Seeded the demo sugarbush into an empty database.');
    await db.destroy();
  }
  if (!fs.existsSync(path.join(root, 'dist', 'index.html'))) {
    console.log('Building the client (first start)…');
    const vite = path.join(root, 'node_modules', 'vite', 'bin', 'vite.js');
    const result = spawnSync(process.execPath, [vite, 'build', '--logLevel', 'error'], {
      cwd: root,
      stdio: 'inherit',
    });
    if (result.status !== 0) throw new Error('The client build failed');
  }
  const { config: c, db } = await startServer();
  console.log(`\nClearwood is serving on ${c.appUrl}  (database: ${describeDb(c.database)})`);
  const demo = await db('users').where({ email: DEMO_USERS[0].email }).first('id');
  if (demo) {
    console.log(`Sign in at ${c.appUrl}/sign-in with any of these (password ${DEMO_PASSWORD}):`);
    for (const u of DEMO_USERS) console.log(`  ${u.email.padEnd(32)} ${u.role}`);
  } else {
    console.log(`Create the first account at ${c.appUrl}/sign-up`);
  }
  if (c.MAIL_TRANSPORT === 'outbox')
    console.log('Mail goes to the local outbox: each message and its link is printed here.');
}

main().catch(exitOnConfigError);
