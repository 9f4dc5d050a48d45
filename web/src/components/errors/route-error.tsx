import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorMessage } from './error-message';
import { NotFound } from './not-found';

/** The router's error element: a missing page, or a page (or its code chunk) that failed. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFound />;
  if (import.meta.env.DEV) console.error(error);
  return <ErrorMessage />;
}
