import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import { useQuery } from '@tanstack/react-query';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { isApiError } from '@/lib/api-client';
import { workshopSetupQueryOptions } from '../api/get-workshop-setup';
import { CalendarForm } from '../forms/calendar-form';
import { BaysSection } from './bays-section';
import { ClosuresSection } from './closures-section';
import { HolidaysSection } from './holidays-section';

interface Props {
  /** The front desk reads it; a manager changes it (the API enforces the same). */
  readOnly: boolean;
}

/** Manage → Workshop: the calendar, bays, closures and public holidays customers book against. */
export function WorkshopSetupScreen({ readOnly }: Props) {
  const setup = useQuery(workshopSetupQueryOptions());
  return (
    <>
      <PageHeader
        title={readOnly ? 'Hours and bays' : 'Workshop'}
        lead={
          readOnly
            ? 'The workshop’s time zone, opening hours, bays, closures and public holidays.'
            : 'What customers can book: the clock, the week’s hours, the bays, closures and public holidays.'
        }
      />
      {setup.isPending ? (
        <LoadingScreen label="Loading the workshop set-up" />
      ) : setup.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void setup.refetch()}>
              Try again
            </Button>
          }
        >
          {isApiError(setup.error) ? setup.error.message : 'The set-up could not be loaded.'}
        </Alert>
      ) : (
        <Box
          sx={{ display: 'grid', gap: 4, maxWidth: 1040, gridTemplateColumns: 'minmax(0, 1fr)' }}
        >
          <CalendarForm setup={setup.data} readOnly={readOnly} />
          <BaysSection bays={setup.data.bays} readOnly={readOnly} />
          <ClosuresSection closures={setup.data.closures} readOnly={readOnly} />
          <HolidaysSection
            holidays={setup.data.holidays}
            region={setup.data.holidayRegion}
            regions={setup.data.holidayRegions}
            readOnly={readOnly}
          />
        </Box>
      )}
    </>
  );
}
