import type { Server } from 'node:http';
import { createApp } from './app';
import { ConfigError, loadConfig } from './config';
import { openDb, migrateLatest } from './db';
import { holdServerLock } from './lib/server-lock';

/** Migrate, then listen. Resolves once the server accepts connections. */
export async function startServer(env: NodeJS.ProcessEnv = process.env) {
  const config = loadConfig(env);
  const db = openDb(config.database);
  await migrateLatest(db);
  const app = createApp({ config, db });
  // A restore refuses to replace the SQLite file while this names a live process.
  const releaseLock =
    config.database.client === 'sqlite' ? holdServerLock(config.database.filename) : () => {};
  const server = await new Promise<Server>((resolve, reject) => {
    const s = config.HOST
      ? app.listen(config.PORT, config.HOST, () => resolve(s))
      : app.listen(config.PORT, () => resolve(s));
    s.on('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.PORT;
  const url = `http://localhost:${port}`;
  // A free port picked at start (PORT=0) is the one mailed links must name.
  if (!env.APP_URL && config.PORT === 0) config.appUrl = url;
  const close = async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await app.ctx.background.idle();
    await app.ctx.advice.close();
    app.ctx.photos.close();
    await db.destroy();
    releaseLock();
  };
  return { config, db, server, url, close, ctx: app.ctx };
}

export function exitOnConfigError(err: unknown): never {
  if (err instanceof ConfigError) {
    console.error(err.message);
    process.exit(2);
  }
  console.error(err);
  process.exit(1);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  startServer().catch(exitOnConfigError);
}
