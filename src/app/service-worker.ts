import { appUpdate } from '@/lib/app-update';

/**
 * Registers the service worker of the production build (none in development or tests). A new
 * build installs in the background and waits; the shell offers the reload (`appUpdate`).
 */
export async function registerServiceWorker(): Promise<void> {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  const { registerSW } = await import('virtual:pwa-register');
  const updateServiceWorker = registerSW({
    onNeedRefresh: () => appUpdate.ready(() => void updateServiceWorker(true)),
  });
}
