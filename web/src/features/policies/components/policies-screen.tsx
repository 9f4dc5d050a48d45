import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { useQuery } from '@tanstack/react-query';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { policiesQueryOptions } from '../api/get-policies';
import { PolicyForm } from '../forms/policy-form';

/** Manage → Policies: labour rate, GST, fitting, disposal, package discount, deposit, validity. */
export function PoliciesScreen({ timeZone }: { timeZone?: string }) {
  const policies = useQuery(policiesQueryOptions());
  return (
    <>
      <PageHeader
        title="Policies"
        lead={
          policies.data
            ? `How quotes are priced. Last changed ${formatDateTime(policies.data.updatedAt, timeZone)}.`
            : 'How quotes are priced.'
        }
      />
      {policies.isPending ? (
        <LoadingScreen label="Loading the policies" />
      ) : policies.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void policies.refetch()}>
              Try again
            </Button>
          }
        >
          {isApiError(policies.error)
            ? policies.error.message
            : 'The policies could not be loaded.'}
        </Alert>
      ) : (
        <PolicyForm policy={policies.data} timeZone={timeZone} />
      )}
    </>
  );
}
