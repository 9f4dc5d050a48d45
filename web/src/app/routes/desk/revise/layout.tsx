import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Link as RouterLink, Outlet, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';
import { buildFromQuote, reviseStorageKey } from '@/features/planner/forms/build';
import { PlannerProvider, type PlannerConfig } from '@/features/planner/hooks/use-planner';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { isApiError } from '@/lib/api-client';
import type { Quote } from '@/types/api';

function latestVersionNumber(quote: Quote): number {
  return Math.max(0, ...quote.versions.map((version) => version.number));
}

/**
 * The front desk revises a quote in the planner: prefilled from the quote's latest version, kept
 * under a storage key of its own per quote (never the customer's or the walk-in's build).
 */
export default function ReviseLayoutRoute() {
  const { quoteId = '' } = useParams();
  const { data: user } = useUser();
  const role = user?.role ?? null;
  const quote = useQuery(quoteQueryOptions(quoteId));
  const config = useMemo<PlannerConfig | null>(() => {
    if (!quote.data) return null;
    const latest = latestVersionNumber(quote.data);
    return {
      storageKey: reviseStorageKey(quote.data.id),
      basePath: paths.desk.revise.getHref(quote.data.id),
      mode: 'revise',
      viewerRole: role,
      firstStepBackHref: paths.desk.quote.getHref(quote.data.id),
      initialBuild: buildFromQuote(quote.data),
      // A revision begun on an older version is dropped: the quote has moved on since.
      acceptStored: (stored) =>
        stored.revision?.quoteId === quote.data.id && stored.revision.baseVersionNumber === latest,
      revisedQuote: quote.data,
    };
  }, [quote.data, role]);

  if (quote.isPending) return <LoadingScreen label="Loading the quote" />;
  if (quote.isError || !config) {
    return (
      <>
        <PageHeader title="Quote not found" />
        <Alert severity="error">
          {isApiError(quote.error) ? quote.error.message : 'The quote could not be loaded.'}
        </Alert>
        <Link
          component={RouterLink}
          to={paths.desk.quotes.getHref()}
          sx={{ display: 'inline-block', mt: 2 }}
        >
          All quotes
        </Link>
      </>
    );
  }
  // The provider reads the stored (or prefilled) build once per quote and version: a refetch of
  // the same quote keeps the desk's work, a newer version starts the revision again.
  return (
    <PlannerProvider
      key={`${config.storageKey}:${latestVersionNumber(quote.data)}`}
      config={config}
    >
      <Outlet />
    </PlannerProvider>
  );
}
