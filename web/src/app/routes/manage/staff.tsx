import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { useId } from 'react';
import { PageHeader } from '@/components/ui/page-header';
import { warmSession } from '@/app/warm-session';
import { useUser } from '@/features/auth/hooks/use-user';
import { staffListQueryOptions } from '@/features/staff/api/get-staff';
import { CreateStaffForm } from '@/features/staff/forms/create-staff-form';
import { StaffTable } from '@/features/staff/components/staff-table';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') await queryClient.prefetchQuery(staffListQueryOptions());
  return null;
};

export default function StaffRoute() {
  const { data: user } = useUser();
  const tableHeadingId = useId();
  const formHeadingId = useId();
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Staff"
        lead="Accounts for the front desk, technicians and managers. Customers create their own."
      />
      <Box sx={{ display: 'grid', gap: 4 }}>
        <Box component="section" aria-labelledby={tableHeadingId}>
          <Typography id={tableHeadingId} variant="h2" sx={{ mb: 1.5 }}>
            Staff accounts
          </Typography>
          <StaffTable currentUserId={user.id} labelledBy={tableHeadingId} />
        </Box>
        <Card component="section" aria-labelledby={formHeadingId} sx={{ maxWidth: 640 }}>
          <CardContent sx={{ p: { xs: 2.5, sm: 3 } }}>
            <Typography id={formHeadingId} variant="h2">
              Add a staff member
            </Typography>
            <CreateStaffForm formLabelId={formHeadingId} />
          </CardContent>
        </Card>
      </Box>
    </>
  );
}
