import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router';

/** Renders one page at a URL, with a fresh cache that does not retry. */
export function renderPage(options: {
  path: string;
  url: string;
  element: ReactElement;
  handle?: unknown;
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
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient, user };
}
