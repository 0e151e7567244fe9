import { onlineManager } from '@tanstack/react-query';

/** How often a device that lost the server asks again whether it is back. */
export const PROBE_INTERVAL_MS = 5000;

let probe: ReturnType<typeof setInterval> | null = null;

function stopProbe() {
  if (probe !== null) clearInterval(probe);
  probe = null;
}

/**
 * The browser's own online flag misses a network that is there but carries nothing (a weak
 * signal at the edge of the stand, a captive portal): it says online while every request fails.
 * A request that could not reach the server therefore counts as offline too, so entries wait
 * (paused) and the page says so; a light request every few seconds notices when the server
 * answers again, and the browser's "online" event still counts as ever.
 */
export function serverUnreachable(check: () => Promise<unknown>): void {
  if (onlineManager.isOnline()) onlineManager.setOnline(false);
  if (probe !== null) return;
  probe = setInterval(() => {
    check().then(serverReached, () => {
      // Still nothing: ask again at the next tick.
    });
  }, PROBE_INTERVAL_MS);
}

/** Any answer from the server (even a refusal) means the network carries again. */
export function serverReached(): void {
  stopProbe();
  if (!onlineManager.isOnline()) onlineManager.setOnline(true);
}

if (typeof window !== 'undefined') {
  // The browser's own word that the network is back ends the probing too.
  window.addEventListener('online', stopProbe);
}
