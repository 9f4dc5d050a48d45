import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { formatCalendarDate } from '@/lib/format';
import type { Closure } from '@/types/api';
import { useDeleteClosure } from '../api/delete-closure';
import { ClosureForm } from '../forms/closure-form';

function closureDates(closure: Closure): string {
  return closure.startDate === closure.endDate
    ? formatCalendarDate(closure.startDate)
    : `${formatCalendarDate(closure.startDate)} to ${formatCalendarDate(closure.endDate)}`;
}

interface Props {
  closures: readonly Closure[];
  readOnly: boolean;
}

/** Days the workshop is shut (stocktake, a holiday of its own), with add and remove. */
export function ClosuresSection({ closures, readOnly }: Props) {
  const headingId = useId();
  const formHeadingId = useId();
  const titleId = useId();
  const textId = useId();
  const [removing, setRemoving] = useState<Closure | null>(null);
  const deleteClosure = useDeleteClosure();
  const close = () => {
    if (deleteClosure.isPending) return;
    deleteClosure.reset();
    setRemoving(null);
  };

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Typography id={headingId} variant="h2" sx={{ mb: 0.5 }}>
        Closures
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
        No start times are offered on these days, and a job that would run into them waits for the
        next open day.
      </Typography>
      {closures.length === 0 ? (
        <Typography color="text.secondary">No closures ahead.</Typography>
      ) : (
        <Card variant="outlined">
          <List aria-labelledby={headingId} dense>
            {closures.map((closure) => (
              <ListItem
                key={closure.id}
                divider
                secondaryAction={
                  readOnly ? undefined : (
                    <Button
                      size="small"
                      color="error"
                      onClick={() => setRemoving(closure)}
                      aria-label={`Remove the closure ${closureDates(closure)}`}
                    >
                      Remove
                    </Button>
                  )
                }
                sx={{ pr: readOnly ? 2 : 12 }}
              >
                <ListItemText primary={closureDates(closure)} secondary={closure.reason} />
              </ListItem>
            ))}
          </List>
        </Card>
      )}
      {!readOnly && (
        <Card variant="outlined" sx={{ mt: 2 }}>
          <CardContent>
            <Typography id={formHeadingId} variant="h3">
              Add a closure
            </Typography>
            <ClosureForm labelledBy={formHeadingId} />
          </CardContent>
        </Card>
      )}
      <Dialog
        open={removing !== null}
        onClose={close}
        aria-labelledby={titleId}
        aria-describedby={textId}
      >
        <DialogTitle id={titleId}>Remove this closure?</DialogTitle>
        <DialogContent>
          <DialogContentText id={textId}>
            {removing
              ? `${closureDates(removing)} (${removing.reason}) opens again with the usual hours, and customers can book those days.`
              : ''}
          </DialogContentText>
          {deleteClosure.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {isApiError(deleteClosure.error)
                ? deleteClosure.error.message
                : 'The closure could not be removed.'}
            </Alert>
          )}
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={close} disabled={deleteClosure.isPending}>
            Keep it
          </Button>
          <Button
            variant="contained"
            color="error"
            disabled={deleteClosure.isPending}
            onClick={() => {
              if (removing)
                deleteClosure.mutate(removing.id, { onSuccess: () => setRemoving(null) });
            }}
            startIcon={
              deleteClosure.isPending ? (
                <CircularProgress size={18} color="inherit" aria-hidden />
              ) : undefined
            }
          >
            Remove
          </Button>
        </DialogActions>
      </Dialog>
    </Box>
  );
}
