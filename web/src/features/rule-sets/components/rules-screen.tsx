import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Skeleton from '@mui/material/Skeleton';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { ruleSetsQueryOptions } from '../api/get-rule-sets';
import { RuleSetForm } from '../forms/rule-set-form';

/** Manage → Rules: the modification limits each rule set applies in the fit report. */
export function RulesScreen() {
  const ruleSets = useQuery(ruleSetsQueryOptions());
  const [searchParams, setSearchParams] = useSearchParams();
  const items = ruleSets.data?.items ?? [];
  const chosenId = searchParams.get('set');
  const ruleSet =
    items.find((item) => item.id === chosenId) ?? items.find((item) => item.isDefault) ?? items[0];

  return (
    <>
      <PageHeader
        title="Rules"
        lead="The modification limits the fit report checks each package against, rule set by rule set."
      />
      <Alert severity="info" sx={{ mb: 2.5 }}>
        Limits differ by jurisdiction and change over time. Before relying on a value here, confirm
        it with the road authority where the vehicle is registered; beyond these limits a vehicle
        needs an engineer&apos;s certificate.
      </Alert>

      {ruleSets.isError && (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => ruleSets.refetch()}>
              Try again
            </Button>
          }
        >
          The rule sets could not be loaded. {ruleSets.error.message}
        </Alert>
      )}
      {ruleSets.isPending && (
        <Box aria-busy="true">
          <Skeleton variant="rounded" height={56} sx={{ maxWidth: 420, mb: 2 }} />
          <Skeleton variant="rounded" height={320} />
        </Box>
      )}

      {ruleSet && (
        <>
          <Box
            sx={{
              display: 'flex',
              flexWrap: 'wrap',
              alignItems: 'flex-start',
              gap: 2,
              mb: 2,
            }}
          >
            <TextField
              select
              label="Rule set"
              value={ruleSet.id}
              onChange={(event) => {
                setSearchParams({ set: event.target.value }, { replace: true });
              }}
              margin="none"
              sx={{ flex: '1 1 260px', maxWidth: 420 }}
              slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
            >
              {items.map((item) => (
                <option key={item.id} value={item.id}>
                  {item.isDefault ? `${item.name} (default)` : item.name}
                </option>
              ))}
            </TextField>
            <Box sx={{ flex: '2 1 320px', minWidth: 0 }}>
              <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
                <Typography sx={{ fontWeight: 500 }}>{ruleSet.jurisdiction}</Typography>
                {ruleSet.isDefault && (
                  <Chip size="small" color="primary" variant="outlined" label="Default" />
                )}
              </Box>
              {ruleSet.description && (
                <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
                  {ruleSet.description}
                </Typography>
              )}
            </Box>
          </Box>

          <RuleSetForm key={ruleSet.id} ruleSet={ruleSet} />
        </>
      )}
    </>
  );
}
