// A feature's layout.tsx: the role check for every page of the feature. It runs above the feature's
// loading.tsx (a Suspense boundary): once a loading state has streamed the answer is already HTTP 200,
// so a refusal made below it could no longer answer 403. Pages keep their own check beside their
// data: a client-side navigation re-renders only the segments that change, not this layout.
import 'server-only';
import type { ReactNode } from 'react';
import { requirePageUser } from '@/lib/auth/page-user';
import type { Action } from '@/lib/auth/permissions';

export function roleGateLayout(action: Action) {
  return async function RoleGate({ children }: { children: ReactNode }) {
    await requirePageUser(action);
    return children;
  };
}

/** An id segment's layout.tsx: the record must exist (404) before its loading state can stream. */
export function recordGateLayout<Param extends string>(
  param: Param,
  orNotFound: (rawId: string) => Promise<unknown>,
) {
  return async function RecordGate({
    children,
    params,
  }: {
    children: ReactNode;
    params: Promise<Record<Param, string>>;
  }) {
    await orNotFound((await params)[param]);
    return children;
  };
}
