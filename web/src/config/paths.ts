/** Every route of the web client, with the href builder the links use. */

function withQuery(path: string, query: Record<string, string | null | undefined>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) search.set(key, value);
  const text = search.toString();
  return text ? `${path}?${text}` : path;
}

export const paths = {
  home: { path: '/', getHref: () => '/' },
  plan: {
    path: '/plan',
    getHref: () => '/plan',
    /** One planner step: "/plan/wheels". */
    step: (step: string) => `/plan/${step}`,
    /** The step after the review: a time in the workshop for a saved quote. */
    book: {
      path: '/plan/book/:quoteId',
      getHref: (quoteId: string) => `/plan/book/${encodeURIComponent(quoteId)}`,
    },
  },
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (redirectTo?: string | null) => withQuery('/sign-in', { redirectTo }),
    },
    register: {
      path: '/register',
      getHref: (redirectTo?: string | null) => withQuery('/register', { redirectTo }),
    },
    forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
    resetPassword: {
      path: '/reset-password',
      getHref: (token: string) => withQuery('/reset-password', { token }),
    },
  },
  account: {
    home: { path: '/account', getHref: () => '/account' },
    quotes: { path: '/account/quotes', getHref: () => '/account/quotes' },
    quote: {
      path: '/account/quotes/:quoteId',
      getHref: (quoteId: string) => `/account/quotes/${encodeURIComponent(quoteId)}`,
    },
    /** A revised version beside the one before it, to accept or decline. */
    quoteCompare: {
      path: '/account/quotes/:quoteId/versions/:versionNumber/compare',
      getHref: (quoteId: string, versionNumber: number) =>
        `/account/quotes/${encodeURIComponent(quoteId)}/versions/${versionNumber}/compare`,
    },
    bookings: { path: '/account/bookings', getHref: () => '/account/bookings' },
    booking: {
      path: '/account/bookings/:bookingId',
      getHref: (bookingId: string) => `/account/bookings/${encodeURIComponent(bookingId)}`,
    },
    /** Where the payment provider sends the customer after paying the deposit. */
    bookingPaid: {
      path: '/account/bookings/:bookingId/paid',
      getHref: (bookingId: string) => `/account/bookings/${encodeURIComponent(bookingId)}/paid`,
    },
    /** Where the payment provider sends the customer who left its page without paying. */
    bookingDepositCancelled: {
      path: '/account/bookings/:bookingId/deposit-cancelled',
      getHref: (bookingId: string) =>
        `/account/bookings/${encodeURIComponent(bookingId)}/deposit-cancelled`,
    },
  },
  desk: {
    home: { path: '/desk', getHref: () => '/desk' },
    walkIn: {
      path: '/desk/walk-in',
      getHref: () => '/desk/walk-in',
      /** One step of the walk-in quote: "/desk/walk-in/customer", "/desk/walk-in/wheels". */
      step: (step: string) => `/desk/walk-in/${step}`,
    },
    quotes: {
      path: '/desk/quotes',
      getHref: (q?: string | null) => withQuery('/desk/quotes', { q }),
    },
    quote: {
      path: '/desk/quotes/:quoteId',
      getHref: (quoteId: string) => `/desk/quotes/${encodeURIComponent(quoteId)}`,
    },
    /** The planner revising a quote: its steps under "/desk/quotes/:quoteId/revise/". */
    revise: {
      path: '/desk/quotes/:quoteId/revise',
      getHref: (quoteId: string) => `/desk/quotes/${encodeURIComponent(quoteId)}/revise`,
      /** One step of the revision: "/desk/quotes/…/revise/review". */
      step: (quoteId: string, step: string) =>
        `/desk/quotes/${encodeURIComponent(quoteId)}/revise/${step}`,
    },
    /** The day board: bays as columns, one day (or a week) of working time. */
    board: {
      path: '/desk/board',
      getHref: (date?: string | null, view?: 'day' | 'week' | null) =>
        withQuery('/desk/board', { date, view: view === 'week' ? 'week' : null }),
    },
    /** Every booking as a table, with the requests waiting for confirmation. */
    bookings: { path: '/desk/bookings', getHref: () => '/desk/bookings' },
    booking: {
      path: '/desk/bookings/:bookingId',
      getHref: (bookingId: string) => `/desk/bookings/${encodeURIComponent(bookingId)}`,
    },
    /** The workshop's hours, bays, closures and holidays, read-only for the front desk. */
    workshop: { path: '/desk/workshop', getHref: () => '/desk/workshop' },
  },
  workshop: {
    home: { path: '/workshop', getHref: () => '/workshop' },
  },
  manage: {
    home: { path: '/manage', getHref: () => '/manage' },
    staff: { path: '/manage/staff', getHref: () => '/manage/staff' },
    policies: { path: '/manage/policies', getHref: () => '/manage/policies' },
    catalogue: { path: '/manage/catalogue', getHref: () => '/manage/catalogue' },
    vehicles: { path: '/manage/vehicles', getHref: () => '/manage/vehicles' },
    workshop: { path: '/manage/workshop', getHref: () => '/manage/workshop' },
    rules: {
      path: '/manage/rules',
      /** With a rule set's id, that set is the one open for editing. */
      getHref: (ruleSetId?: string | null) => withQuery('/manage/rules', { set: ruleSetId }),
    },
  },
} as const;

/**
 * A return path from the query string, accepted only when it stays on this site (a relative
 * path, not "//host"), so a crafted link cannot send someone elsewhere after signing in.
 */
export function safeRedirectPath(value: string | null | undefined): string | null {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) {
    return null;
  }
  return value;
}
