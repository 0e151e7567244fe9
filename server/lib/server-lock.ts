import fs from 'node:fs';

/**
 * A running server names itself in `<database file>.server-pid`, so that a restore can refuse to
 * swap the file from under it. A file left by a server that was killed names a process that is
 * gone, and counts for nothing.
 */
export const serverLockFileOf = (databaseFile: string) => `${databaseFile}.server-pid`;

export interface ServerLock {
  pid: number;
  startedAt: string;
}

/** Write the lock file for this process; the function returned removes it again. */
export function holdServerLock(databaseFile: string): () => void {
  const file = serverLockFileOf(databaseFile);
  const mine: ServerLock = { pid: process.pid, startedAt: new Date().toISOString() };
  fs.writeFileSync(file, `${JSON.stringify(mine)}\n`);
  const release = () => {
    process.off('exit', release);
    try {
      const held = readLock(file);
      if (held?.pid === process.pid) fs.rmSync(file, { force: true });
    } catch {
      // Leaving a stale file is harmless: its process is gone.
    }
  };
  process.on('exit', release);
  return release;
}

/** The server that holds this database file now, or null when none does. */
export function serverHolding(databaseFile: string): ServerLock | null {
  const held = readLock(serverLockFileOf(databaseFile));
  if (!held || held.pid === process.pid) return null;
  return isAlive(held.pid) ? held : null;
}

function readLock(file: string): ServerLock | null {
  let text: string;
  try {
    text = fs.readFileSync(file, 'utf8');
  } catch {
    return null;
  }
  try {
    const parsed = JSON.parse(text) as Partial<ServerLock>;
    return Number.isInteger(parsed.pid) && (parsed.pid as number) > 0
      ? { pid: parsed.pid as number, startedAt: String(parsed.startedAt ?? '') }
      : null;
  } catch {
    return null;
  }
}

/** Signal 0 asks only whether the process exists; EPERM means it does, under another user. */
function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}
