import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogTitle from '@mui/material/DialogTitle';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import Add from '@mui/icons-material/Add';
import { useId, useState } from 'react';
import type { Bay } from '@/types/api';
import { bayKindLabel } from '../forms/bay-fields';
import { BayForm } from '../forms/bay-form';

/** Columns that give way on phones (the kind moves under the name). */
const notOnPhones = { display: { xs: 'none', sm: 'table-cell' } } as const;

interface Props {
  bays: readonly Bay[];
  readOnly: boolean;
}

/** The bays in their order (a job takes the first free bay of its kind), with add and edit. */
export function BaysSection({ bays, readOnly }: Props) {
  const headingId = useId();
  const titleId = useId();
  const [open, setOpen] = useState(false);
  const [editing, setEditing] = useState<Bay | null>(null);
  const sorted = [...bays].sort((a, b) => a.position - b.position);
  const openFor = (bay: Bay | null) => {
    setEditing(bay);
    setOpen(true);
  };
  const close = () => setOpen(false);

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Box
        sx={{
          display: 'flex',
          justifyContent: 'space-between',
          alignItems: 'center',
          gap: 1,
          flexWrap: 'wrap',
          mb: 1.5,
        }}
      >
        <Typography id={headingId} variant="h2">
          Bays
        </Typography>
        {!readOnly && (
          <Button variant="outlined" startIcon={<Add aria-hidden />} onClick={() => openFor(null)}>
            Add a bay
          </Button>
        )}
      </Box>
      {sorted.length === 0 ? (
        <Typography color="text.secondary">
          No bays yet: nothing can be booked until there is one of each kind a job needs.
        </Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table size="small" aria-labelledby={headingId}>
            <TableHead>
              <TableRow>
                <TableCell scope="col" sx={{ width: 48, ...notOnPhones }}>
                  Order
                </TableCell>
                <TableCell scope="col">Name</TableCell>
                <TableCell scope="col" sx={notOnPhones}>
                  Kind
                </TableCell>
                <TableCell scope="col">Status</TableCell>
                {!readOnly && (
                  <TableCell scope="col" sx={{ textAlign: 'right' }}>
                    Actions
                  </TableCell>
                )}
              </TableRow>
            </TableHead>
            <TableBody>
              {sorted.map((bay) => (
                <TableRow key={bay.id}>
                  <TableCell sx={notOnPhones}>{bay.position}</TableCell>
                  <TableCell component="th" scope="row">
                    <Box component="span" sx={{ fontWeight: 500, display: 'block' }}>
                      {bay.name}
                    </Box>
                    <Box
                      component="span"
                      sx={{ display: { xs: 'block', sm: 'none' }, color: 'text.secondary' }}
                    >
                      {bayKindLabel[bay.kind]}, number {bay.position}
                    </Box>
                  </TableCell>
                  <TableCell sx={notOnPhones}>{bayKindLabel[bay.kind]}</TableCell>
                  <TableCell>
                    <Chip
                      size="small"
                      variant="outlined"
                      color={bay.active ? 'success' : 'default'}
                      label={bay.active ? 'In use' : 'Switched off'}
                    />
                  </TableCell>
                  {!readOnly && (
                    <TableCell sx={{ textAlign: 'right' }}>
                      <Button
                        size="small"
                        onClick={() => openFor(bay)}
                        aria-label={`Edit ${bay.name}`}
                      >
                        Edit
                      </Button>
                    </TableCell>
                  )}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      {!readOnly && (
        <Dialog
          open={open}
          onClose={close}
          fullWidth
          maxWidth="xs"
          aria-labelledby={titleId}
          slotProps={{ transition: { onExited: () => setEditing(null) } }}
        >
          <DialogTitle id={titleId}>{editing ? `Edit ${editing.name}` : 'Add a bay'}</DialogTitle>
          {open && (
            <BayForm
              key={editing?.id ?? 'new'}
              bay={editing}
              bayCount={sorted.length}
              titleId={titleId}
              onCancel={close}
              onSaved={close}
            />
          )}
        </Dialog>
      )}
    </Box>
  );
}
