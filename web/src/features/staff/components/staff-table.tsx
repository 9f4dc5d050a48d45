import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Skeleton from '@mui/material/Skeleton';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { roleLabels } from '@/config/roles';
import { formatDate } from '@/lib/format';
import type { StaffMember } from '@/types/api';
import { staffListQueryOptions } from '../api/get-staff';
import { EditStaffDialog } from './edit-staff-dialog';

/** Columns that give way on narrow screens (the e-mail moves under the name). */
const wideOnly = { display: { xs: 'none', md: 'table-cell' } } as const;
const notOnPhones = { display: { xs: 'none', sm: 'table-cell' } } as const;

interface Props {
  /** The signed-in manager, who may edit their own name but not their role or status. */
  currentUserId: string;
  /** Names the table (the id of the heading above it). */
  labelledBy?: string;
}

export function StaffTable({ currentUserId, labelledBy }: Props) {
  const staff = useQuery(staffListQueryOptions());
  const [editing, setEditing] = useState<StaffMember | null>(null);
  const [dialogOpen, setDialogOpen] = useState(false);

  if (staff.isError) {
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={() => staff.refetch()}>
            Try again
          </Button>
        }
      >
        The staff list could not be loaded. {staff.error.message}
      </Alert>
    );
  }

  const members = staff.data?.items ?? [];
  return (
    <>
      <TableContainer component={Paper} variant="outlined">
        <Table aria-labelledby={labelledBy} aria-busy={staff.isPending || undefined}>
          <TableHead>
            <TableRow>
              <TableCell>Name</TableCell>
              <TableCell sx={wideOnly}>E-mail</TableCell>
              <TableCell sx={notOnPhones}>Role</TableCell>
              <TableCell sx={notOnPhones}>Status</TableCell>
              <TableCell sx={wideOnly}>Added</TableCell>
              <TableCell align="right">
                <Box component="span" sx={visuallyHidden}>
                  Actions
                </Box>
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {staff.isPending &&
              [0, 1, 2].map((row) => (
                <TableRow key={row}>
                  <TableCell colSpan={6}>
                    <Skeleton aria-hidden />
                  </TableCell>
                </TableRow>
              ))}
            {!staff.isPending && members.length === 0 && (
              <TableRow>
                <TableCell colSpan={6}>
                  <Typography color="text.secondary">No staff accounts yet.</Typography>
                </TableCell>
              </TableRow>
            )}
            {members.map((member) => (
              <TableRow key={member.id} hover>
                <TableCell sx={{ minWidth: 0 }}>
                  <Typography sx={{ fontWeight: 500 }}>
                    {member.name}
                    {member.id === currentUserId && (
                      <Typography component="span" color="text.secondary">
                        {' '}
                        (you)
                      </Typography>
                    )}
                  </Typography>
                  <Typography
                    variant="body2"
                    color="text.secondary"
                    sx={{ display: { md: 'none' }, overflowWrap: 'anywhere' }}
                  >
                    {member.email}
                  </Typography>
                  <Typography
                    variant="body2"
                    color={member.active ? 'text.secondary' : 'warning.main'}
                    sx={{ display: { sm: 'none' } }}
                  >
                    {roleLabels[member.role]} · {member.active ? 'Active' : 'Inactive'}
                  </Typography>
                </TableCell>
                <TableCell sx={{ ...wideOnly, overflowWrap: 'anywhere' }}>{member.email}</TableCell>
                <TableCell sx={notOnPhones}>{roleLabels[member.role]}</TableCell>
                <TableCell sx={notOnPhones}>
                  <Chip
                    size="small"
                    label={member.active ? 'Active' : 'Inactive'}
                    color={member.active ? 'success' : 'default'}
                    variant={member.active ? 'filled' : 'outlined'}
                  />
                </TableCell>
                <TableCell sx={{ ...wideOnly, whiteSpace: 'nowrap' }}>
                  {formatDate(member.createdAt)}
                </TableCell>
                <TableCell align="right">
                  <Button
                    size="small"
                    variant="outlined"
                    onClick={() => {
                      setEditing(member);
                      setDialogOpen(true);
                    }}
                    aria-label={`Edit ${member.name}`}
                  >
                    Edit
                  </Button>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
      <EditStaffDialog
        open={dialogOpen}
        member={editing}
        currentUserId={currentUserId}
        onClose={() => setDialogOpen(false)}
        onExited={() => setEditing(null)}
      />
    </>
  );
}
