// Loader helpers that decide who may see a screen before it renders: no session → sign-in (with
// the way back), wrong role → a 403 the route's error page explains. With no network they go by
// the signed-in person restored from the tablet's cache (lib/persist-cache.ts).
import { roleLabels, type Me, type Role } from '@heatpath/contracts';
import { onlineManager, type QueryClient } from '@tanstack/react-query';
import { data, redirect } from 'react-router';
import { isUnauthenticated } from '../lib/api-client';
import { meQueryKey, meQueryOptions } from '../lib/auth';
import { getArea, mayRead, type Area, type AreaId } from './areas';

export interface ForbiddenData {
  message: string;
}

/** Where to send someone whose session is missing, remembering the screen they wanted. */
export function signInPath(wanted: string): string {
  return wanted === '/' || wanted.startsWith('/sign-in')
    ? '/sign-in'
    : `/sign-in?next=${encodeURIComponent(wanted)}`;
}

/** Accepts only a path inside this app, so a crafted link cannot bounce a person elsewhere. */
export function safeNextPath(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-in')) {
    return '/';
  }
  return next;
}

function toSignIn(request: Request) {
  const url = new URL(request.url);
  return redirect(signInPath(url.pathname + url.search));
}

/**
 * The signed-in person: the one in the cache (restored after a reload, and refreshed by the
 * screens that show it), else asked of the server. Offline with nobody in the cache, the question
 * would wait for the network with the page blank: sign-in says what is needed instead.
 */
export async function requireMe(queryClient: QueryClient, request: Request): Promise<Me> {
  if (!onlineManager.isOnline() && queryClient.getQueryData(meQueryKey) === undefined) {
    throw toSignIn(request);
  }
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (error) {
    if (isUnauthenticated(error)) throw toSignIn(request);
    throw error;
  }
}

function forbidden(area: Area, roles: readonly Role[], me: Me) {
  const who = roles.map((role) => roleLabels[role]).join(', ');
  return data<ForbiddenData>(
    { message: `${area.label} is open to: ${who}. You are signed in as ${roleLabels[me.role]}.` },
    { status: 403 },
  );
}

export async function requireArea(
  queryClient: QueryClient,
  request: Request,
  areaId: AreaId,
): Promise<Me> {
  const me = await requireMe(queryClient, request);
  const area = getArea(areaId);
  if (!area.roles.includes(me.role)) throw forbidden(area, area.roles, me);
  return me;
}

/** For one record of an area (a case page): its own roles and its readers may open it. */
export async function requireAreaRecord(
  queryClient: QueryClient,
  request: Request,
  areaId: AreaId,
): Promise<Me> {
  const me = await requireMe(queryClient, request);
  const area = getArea(areaId);
  if (!mayRead(area, me.role)) throw forbidden(area, [...area.roles, ...(area.readers ?? [])], me);
  return me;
}
