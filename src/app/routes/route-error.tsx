import { lazy, Suspense } from 'react';
import { isRouteErrorResponse, useRouteError } from 'react-router';
import { LinkButton } from '@/components/ui/link-button';
import { MainLandmark } from '@/components/ui/main-landmark';
import { PageHeading } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { messageOf } from '@/lib/errors';

// Loaded only when a code is not found, so the first load stays small.
const UnknownCode = lazy(() => import('./unknown-code').then((m) => ({ default: m.UnknownCode })));
const UNKNOWN_CODE_ERRORS = ['TOOL_NOT_FOUND', 'BIN_NOT_FOUND'];

export function RouteError() {
  const error = useRouteError();
  if (error instanceof ApiError && UNKNOWN_CODE_ERRORS.includes(error.code)) {
    return (
      <Suspense fallback={<LoadingRoute />}>
        <UnknownCode message={error.message} />
      </Suspense>
    );
  }
  let title = 'Something went wrong';
  let message = messageOf(error);
  if (isRouteErrorResponse(error)) {
    title = error.status === 404 ? 'Page not found' : error.status === 403 ? 'Not for your role' : `Error ${error.status}`;
    const body = error.data as { message?: string } | string | undefined;
    message = typeof body === 'string' ? body : (body?.message ?? 'There is nothing at this address.');
  }
  return (
    <MainLandmark className="mx-auto flex max-w-md flex-col gap-4 px-4 py-10">
      <PageHeading title={title} />
      <p role="alert">{message}</p>
      <LinkButton to="/" className="self-start">
        Go to home
      </LinkButton>
    </MainLandmark>
  );
}

/** Shown while the first loaders run (a slow hangar network can take a while). */
export function LoadingRoute() {
  return (
    <MainLandmark className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-2 px-4" aria-busy="true">
      <p className="font-mono text-sm font-medium tracking-widest text-brass-deep uppercase">Gripline</p>
      <p role="status" className="text-steel">
        Loading…
      </p>
    </MainLandmark>
  );
}

export function NotFoundRoute() {
  return (
    <MainLandmark className="mx-auto flex max-w-md flex-col gap-4 px-4 py-10">
      <PageHeading title="Page not found" />
      <p>There is nothing at this address.</p>
      <LinkButton to="/" className="self-start">
        Go to home
      </LinkButton>
    </MainLandmark>
  );
}
