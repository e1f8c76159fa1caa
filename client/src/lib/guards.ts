import { data, redirect, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../config/paths';
import type { Allow } from './auth';
import { meQuery } from './auth';
import { queryClient } from './query-client';

/**
 * Run before a guarded page's loader: a signed-out visitor goes to sign-in and comes back; a signed-in person
 * whose role does not fit gets the 403 page instead of a screen of failed requests.
 */
export async function requireRole(check: Allow, { request }: LoaderFunctionArgs) {
  const user = await queryClient.ensureQueryData(meQuery);
  if (!user) {
    const url = new URL(request.url);
    throw redirect(paths.signIn(url.pathname + url.search));
  }
  if (!check(user)) throw data({ message: 'This page is for other roles.' }, { status: 403 });
  return user;
}
