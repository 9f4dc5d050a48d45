import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient } from '@tanstack/react-query';
import { useMemo, type ComponentType } from 'react';
import {
  createBrowserRouter,
  Outlet,
  ScrollRestoration,
  type LoaderFunction,
  type RouteObject,
} from 'react-router';
// The DOM flavour of the provider, so navigations can ask for ReactDOM.flushSync.
import { RouterProvider } from 'react-router/dom';
import { RouteError } from '@/components/errors/route-error';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { paths } from '@/config/paths';

/** What a lazy route module exports: its page, and optionally a loader that warms the cache. */
interface RouteModule {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

function lazyRoute(queryClient: QueryClient, load: () => Promise<RouteModule>) {
  return async () => {
    const module = await load();
    return {
      Component: module.default,
      ...(module.clientLoader ? { loader: module.clientLoader(queryClient) } : {}),
    };
  };
}

function Root() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Pages of a signed-in area sit under one error boundary, so the area's frame stays up. */
function areaPages(children: RouteObject[]): RouteObject[] {
  return [{ errorElement: <RouteError />, children }];
}

export function createAppRouter(queryClient: QueryClient) {
  const lazy = (load: () => Promise<RouteModule>) => lazyRoute(queryClient, load);
  const notFound = (): RouteObject => ({
    path: '*',
    lazy: lazy(() => import('./routes/not-found')),
  });
  /**
   * The planner's steps, one address each so the browser's Back button works; each step is its
   * own chunk, so opening the planner loads only the first.
   */
  const plannerSteps = (): RouteObject[] => [
    { index: true, lazy: lazy(() => import('./routes/planner/start')) },
    { path: 'vehicle', lazy: lazy(() => import('./routes/planner/vehicle')) },
    { path: 'use', lazy: lazy(() => import('./routes/planner/use')) },
    { path: 'lift', lazy: lazy(() => import('./routes/planner/lift')) },
    { path: 'wheels', lazy: lazy(() => import('./routes/planner/wheels')) },
    { path: 'add-ons', lazy: lazy(() => import('./routes/planner/add-ons')) },
    { path: 'review', lazy: lazy(() => import('./routes/planner/review')) },
  ];

  return createBrowserRouter([
    {
      Component: Root,
      errorElement: <RouteError />,
      hydrateFallbackElement: <LoadingScreen />,
      children: [
        {
          lazy: lazy(() => import('./routes/public/layout')),
          children: areaPages([
            { index: true, lazy: lazy(() => import('./routes/public/home')) },
            {
              path: paths.plan.path,
              lazy: lazy(() => import('./routes/public/plan/layout')),
              children: [
                ...plannerSteps(),
                // After the review, the customer's own planner books a time for the saved quote.
                { path: 'book/:quoteId', lazy: lazy(() => import('./routes/planner/book')) },
              ],
            },
            { path: paths.auth.signIn.path, lazy: lazy(() => import('./routes/public/sign-in')) },
            {
              path: paths.auth.register.path,
              lazy: lazy(() => import('./routes/public/register')),
            },
            {
              path: paths.auth.forgotPassword.path,
              lazy: lazy(() => import('./routes/public/forgot-password')),
            },
            {
              path: paths.auth.resetPassword.path,
              lazy: lazy(() => import('./routes/public/reset-password')),
            },
            notFound(),
          ]),
        },
        {
          path: paths.account.home.path,
          lazy: lazy(() => import('./routes/account/layout')),
          children: areaPages([
            { index: true, lazy: lazy(() => import('./routes/account/home')) },
            {
              path: paths.account.quotes.path,
              lazy: lazy(() => import('./routes/account/quotes')),
            },
            { path: paths.account.quote.path, lazy: lazy(() => import('./routes/account/quote')) },
            {
              path: paths.account.quoteCompare.path,
              lazy: lazy(() => import('./routes/account/quote-compare')),
            },
            {
              path: paths.account.bookings.path,
              lazy: lazy(() => import('./routes/account/bookings')),
            },
            {
              path: paths.account.booking.path,
              lazy: lazy(() => import('./routes/account/booking')),
            },
            {
              path: paths.account.bookingPaid.path,
              lazy: lazy(() => import('./routes/account/booking-paid')),
            },
            {
              path: paths.account.bookingDepositCancelled.path,
              lazy: lazy(() => import('./routes/account/booking-deposit-cancelled')),
            },
            notFound(),
          ]),
        },
        {
          path: paths.desk.home.path,
          lazy: lazy(() => import('./routes/desk/layout')),
          children: areaPages([
            { index: true, lazy: lazy(() => import('./routes/desk/home')) },
            {
              path: paths.desk.walkIn.path,
              lazy: lazy(() => import('./routes/desk/walk-in/layout')),
              children: [
                { path: 'customer', lazy: lazy(() => import('./routes/desk/walk-in/customer')) },
                {
                  lazy: lazy(() => import('./routes/desk/walk-in/steps-frame')),
                  children: plannerSteps(),
                },
              ],
            },
            { path: paths.desk.board.path, lazy: lazy(() => import('./routes/desk/board')) },
            {
              path: paths.desk.bookings.path,
              lazy: lazy(() => import('./routes/desk/bookings')),
            },
            { path: paths.desk.booking.path, lazy: lazy(() => import('./routes/desk/booking')) },
            { path: paths.desk.quotes.path, lazy: lazy(() => import('./routes/desk/quotes')) },
            { path: paths.desk.quote.path, lazy: lazy(() => import('./routes/desk/quote')) },
            {
              // The planner in its revise mode, prefilled from the quote's latest version.
              path: paths.desk.revise.path,
              lazy: lazy(() => import('./routes/desk/revise/layout')),
              children: [
                {
                  lazy: lazy(() => import('./routes/desk/revise/steps-frame')),
                  children: plannerSteps(),
                },
              ],
            },
            {
              path: paths.desk.workshop.path,
              lazy: lazy(() => import('./routes/desk/workshop')),
            },
            notFound(),
          ]),
        },
        {
          path: paths.workshop.home.path,
          lazy: lazy(() => import('./routes/workshop/layout')),
          children: areaPages([
            { index: true, lazy: lazy(() => import('./routes/workshop/home')) },
            notFound(),
          ]),
        },
        {
          path: paths.manage.home.path,
          lazy: lazy(() => import('./routes/manage/layout')),
          children: areaPages([
            { index: true, lazy: lazy(() => import('./routes/manage/home')) },
            { path: paths.manage.staff.path, lazy: lazy(() => import('./routes/manage/staff')) },
            {
              path: paths.manage.catalogue.path,
              lazy: lazy(() => import('./routes/manage/catalogue')),
            },
            {
              path: paths.manage.vehicles.path,
              lazy: lazy(() => import('./routes/manage/vehicles')),
            },
            { path: paths.manage.rules.path, lazy: lazy(() => import('./routes/manage/rules')) },
            {
              path: paths.manage.policies.path,
              lazy: lazy(() => import('./routes/manage/policies')),
            },
            {
              path: paths.manage.workshop.path,
              lazy: lazy(() => import('./routes/manage/workshop')),
            },
            notFound(),
          ]),
        },
      ],
    },
  ]);
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createAppRouter(queryClient), [queryClient]);
  // Router updates are committed as ordinary (not transition) renders: once the address bar
  // shows the new page, its content is on screen in the same task, with no stale frame between.
  return <RouterProvider router={router} useTransitions={false} />;
}
