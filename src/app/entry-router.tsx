import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect } from 'react-router';
import { Spinner } from '../components/ui';
import { AppFrame } from './AppFrame';
import { ErrorPage, NotFoundPage } from './ErrorPages';
import { redirectIfSignedIn, requireSession } from './guards';
import { lazyPage } from './lazy-page';
import { portalRoutes } from './portal-routes';

const SignInPage = lazyPage(() =>
  import('../features/auth/components/SignInPage').then((m) => m.SignInPage),
);

function StartupSpinner() {
  return (
    <div className="flex min-h-screen items-center justify-center">
      <Spinner label="Loading Spanwise…" />
    </div>
  );
}

/** The id of the signed-in frame's page list, where the desk's routes are patched in. */
const PAGES = 'pages';
/** Paths whose routes the entry already holds: opening them never loads the desk's route table. */
const inEntry = (path: string) => path === '/sign-in' || /^\/portal(\/|$)/.test(path);

/**
 * The route table the first load carries: sign-in, the signed-in frame, the home and the builder's
 * portal. Every other route (the desk's pages and their loaders, which parse with the desk's
 * schemas) comes from `router.tsx` on the first visit to a path outside these, through React
 * Router's lazy route discovery, so a builder's phone downloads none of it.
 */
export function createAppRouter(queryClient: QueryClient) {
  let desk: Promise<void> | null = null;
  return createBrowserRouter(
    [
      {
        path: '/sign-in',
        loader: async () => {
          // The health check comes with the sign-in page's code (it parses with zod).
          void import('../features/auth/api/health').then(({ healthQueryOptions }) =>
            queryClient.prefetchQuery(healthQueryOptions()),
          );
          return redirectIfSignedIn(queryClient);
        },
        element: <SignInPage />,
        hydrateFallbackElement: <StartupSpinner />,
        errorElement: <ErrorPage />,
      },
      {
        path: '/',
        id: 'frame',
        loader: ({ request }) => requireSession(queryClient, request),
        element: <AppFrame />,
        hydrateFallbackElement: <StartupSpinner />,
        errorElement: <ErrorPage />,
        children: [
          {
            id: PAGES,
            errorElement: <ErrorPage />,
            children: [
              {
                index: true,
                loader: async ({ request }) => {
                  const me = await requireSession(queryClient, request);
                  // A builder's home is the portal's "what needs you".
                  if (me.user.role === 'builder') throw redirect('/portal');
                  return (await import('./router')).homeLoader(queryClient, me.user.role);
                },
                lazy: async () => ({ Component: (await import('./desk-pages')).HomeRoute }),
              },
              ...portalRoutes(queryClient),
              { path: '*', element: <NotFoundPage /> },
            ],
          },
        ],
      },
    ],
    {
      async patchRoutesOnNavigation({ path, patch }) {
        if (inEntry(path)) return;
        desk ??= import('./router').then(
          ({ deskRoutes }) => patch(PAGES, deskRoutes(queryClient)),
          (error: unknown) => {
            desk = null; // a failed download is tried again on the next navigation
            throw error;
          },
        );
        await desk;
      },
    },
  );
}
