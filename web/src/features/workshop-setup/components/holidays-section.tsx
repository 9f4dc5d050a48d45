import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import FormControlLabel from '@mui/material/FormControlLabel';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { isApiError } from '@/lib/api-client';
import { formatCalendarDate } from '@/lib/format';
import type { Holiday, HolidayRegion } from '@/types/api';
import { useSetHolidayOpening } from '../api/set-holiday-opening';

interface Props {
  holidays: readonly Holiday[];
  region: string;
  regions: readonly HolidayRegion[];
  readOnly: boolean;
}

/** The region's public holidays of the next 12 months; the workshop may open on one anyway. */
export function HolidaysSection({ holidays, region, regions, readOnly }: Props) {
  const headingId = useId();
  const setOpening = useSetHolidayOpening();
  const regionName = regions.find((candidate) => candidate.code === region)?.name ?? region;

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Typography id={headingId} variant="h2" sx={{ mb: 0.5 }}>
        Public holidays
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
        The next 12 months for {regionName}. The workshop is closed on them unless it opens anyway,
        with its usual hours for that weekday.
      </Typography>
      {setOpening.isError && (
        <Alert severity="error" sx={{ mb: 1.5 }}>
          {isApiError(setOpening.error)
            ? setOpening.error.message
            : 'The change was not saved. Please try again.'}
        </Alert>
      )}
      {holidays.length === 0 ? (
        <Typography color="text.secondary">No public holidays in the next 12 months.</Typography>
      ) : (
        <Card variant="outlined">
          <List aria-labelledby={headingId} dense>
            {holidays.map((holiday) => {
              const pending = setOpening.isPending && setOpening.variables?.date === holiday.date;
              const when = formatCalendarDate(holiday.date);
              return (
                <ListItem
                  key={holiday.date}
                  divider
                  sx={{ flexWrap: 'wrap', columnGap: 2, alignItems: 'center' }}
                >
                  <ListItemText
                    primary={holiday.name}
                    secondary={holiday.note ? `${when} · ${holiday.note}` : when}
                    sx={{ flex: '1 1 200px' }}
                  />
                  <FormControlLabel
                    label="Open anyway"
                    disabled={readOnly || pending}
                    control={
                      <Switch
                        checked={holiday.opens}
                        onChange={(event) =>
                          setOpening.mutate({ date: holiday.date, opens: event.target.checked })
                        }
                        slotProps={{
                          input: { 'aria-label': `Open anyway on ${holiday.name}, ${when}` },
                        }}
                      />
                    }
                  />
                </ListItem>
              );
            })}
          </List>
        </Card>
      )}
    </Box>
  );
}
