import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import RestartAlt from '@mui/icons-material/RestartAlt';
import { useId, useState } from 'react';
import { useNavigate } from 'react-router';
import { deleteUpload } from '../api/delete-upload';
import { usePlanner } from '../hooks/use-planner';

/** Clears every choice (after asking) and goes back to the first step. */
export function StartAgainButton() {
  const { build, config, startAgain, stepHref } = usePlanner();
  const [open, setOpen] = useState(false);
  const navigate = useNavigate();
  const titleId = useId();
  const textId = useId();

  const revising = config.mode === 'revise';
  const confirm = () => {
    // Photos not saved with a quote would only wait on the server: remove them too.
    for (const photo of build.photos) void deleteUpload(photo.id).catch(() => undefined);
    startAgain({ keepCustomer: config.mode === 'walk-in' });
    setOpen(false);
    // A revision starts again from the saved version, which opens on the review.
    void navigate(stepHref(revising ? 'review' : 'vehicle'));
  };

  return (
    <>
      <Button
        size="small"
        color="inherit"
        startIcon={<RestartAlt aria-hidden />}
        onClick={() => setOpen(true)}
        sx={{ color: 'text.secondary' }}
      >
        {revising ? 'Undo my changes' : 'Start again'}
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        aria-labelledby={titleId}
        aria-describedby={textId}
      >
        <DialogTitle id={titleId}>{revising ? 'Undo every change?' : 'Start again?'}</DialogTitle>
        <DialogContent>
          <DialogContentText id={textId}>
            {revising
              ? `This puts back version ${build.revision?.baseVersionNumber ?? ''} as it was saved: its parts, quantities and labour, with no discount and no reason yet.`
              : 'This clears the vehicle, how you use it and every part you chose, so you can plan a new build from the first step.'}
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)}>
            {revising ? 'Keep my changes' : 'Keep my build'}
          </Button>
          <Button variant="contained" color="error" onClick={confirm}>
            {revising ? 'Undo the changes' : 'Clear the build'}
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
