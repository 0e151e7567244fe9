import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { StrictMode, type ReactElement } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router';

/** Renders one page at a URL, with a fresh cache that does not retry. */
export function renderPage(options: {
  path: string;
  url: string;
  element: ReactElement;
  handle?: unknown;
  /** Render as the app does, under StrictMode (effects run twice in development). */
  strict?: boolean;
}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter(
    [
      { path: options.path, element: options.element, handle: options.handle },
      { path: '*', element: <p>Elsewhere</p> },
    ],
    { initialEntries: [options.url] },
  );
  const user = userEvent.setup();
  const tree = (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
  const view = render(options.strict ? <StrictMode>{tree}</StrictMode> : tree);
  return { ...view, router, queryClient, user };
}
