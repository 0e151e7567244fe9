import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { ConfigError, loadTestDatabaseUrl } from '../../server/config';

/**
 * `npm run test:pg`: the `server` Vitest project (API, server and demo tests) again, each test app
 * on a fresh database of the PostgreSQL server `TEST_DATABASE_URL` names. With `--if-configured`
 * (as `npm test` runs it) an unset variable skips the pass with one line instead of failing.
 */
const optional = process.argv.includes('--if-configured');
let url: string | undefined;
try {
  url = loadTestDatabaseUrl();
} catch (err) {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(2);
}
if (!url) {
  console.log(
    optional
      ? 'Skipping the PostgreSQL pass of the API tests: TEST_DATABASE_URL is not set.'
      : 'TEST_DATABASE_URL is not set: give it the admin URL of a PostgreSQL server to test against.',
  );
  process.exit(optional ? 0 : 2);
}
const { hostname, port } = new URL(url);
console.log(`API tests on PostgreSQL at ${hostname}:${port || 5432}`);
const vitest = path.resolve(import.meta.dirname, '../../node_modules/vitest/vitest.mjs');
const extra = process.argv.slice(2).filter((a) => a !== '--if-configured');
const run = spawnSync(process.execPath, [vitest, 'run', '--project', 'server', ...extra], {
  stdio: 'inherit',
});
process.exit(run.status ?? 1);
