import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import type { Me } from '../../shared/api/auth';
import type { Role } from '../../shared/api/roles';
import { meQueryOptions } from '../features/auth/api/me';
import { isApiError } from '../lib/api-client';
import { signInPathFor } from './query-client';

/**
 * Loader of the signed-in frame: resolves the session or redirects to /sign-in on 401.
 * Other failures (server down) reach the error page with a readable message.
 */
export async function requireSession(queryClient: QueryClient, request: Request): Promise<Me> {
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      throw redirect(signInPathFor(new URL(request.url)));
    }
    throw error;
  }
}

/** Loader guard of a section: a role outside `roles` gets a 403 page, not a broken screen. */
export async function requireRole(
  queryClient: QueryClient,
  request: Request,
  roles: readonly Role[],
): Promise<Me> {
  const me = await requireSession(queryClient, request);
  if (!roles.includes(me.user.role)) {
    throw new Response('This section is not part of your role.', { status: 403 });
  }
  return me;
}

/** Loader of /sign-in: someone already signed in goes straight to their landing page. */
export async function redirectIfSignedIn(queryClient: QueryClient): Promise<null> {
  const me = await queryClient.ensureQueryData(meQueryOptions()).catch((): null => null);
  if (me) throw redirect('/');
  return null;
}
