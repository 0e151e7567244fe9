import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router';
import { AppProviders } from './app/providers';
import { createAppRouter } from './app/router';
import { registerServiceWorker } from './app/service-worker';
import { createQueryClient } from './lib/query-client';
import { restoreDeviceCache } from './lib/query-persistence';
import './index.css';

const queryClient = createQueryClient();

const root = document.getElementById('root');
if (!root) throw new Error('Clearwood needs a #root element in index.html');

// What the device kept comes back before the first page's loader asks for it (offline too).
void restoreDeviceCache(queryClient).then(() => {
  const router = createAppRouter(queryClient);
  createRoot(root).render(
    <StrictMode>
      <AppProviders queryClient={queryClient}>
        <RouterProvider router={router} />
      </AppProviders>
    </StrictMode>,
  );
  void registerServiceWorker();
});
