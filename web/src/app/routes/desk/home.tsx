import { LandingCard } from '@/components/ui/landing-card';
import { PageHeader } from '@/components/ui/page-header';
import { useUser } from '@/features/auth/hooks/use-user';

export default function DeskHomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <PageHeader title="Front desk" lead={user ? `Signed in as ${user.name}.` : undefined} />
      <LandingCard
        title="No bookings to show yet"
        status="Booking requests and the day board will appear here."
        upcoming={[
          'See every booking request and confirm or reschedule it',
          'The day board: bays as columns, the day or the week as rows',
          'Revise a quote and e-mail it to the customer',
          'Look up a customer and take a walk-in quote',
        ]}
      />
    </>
  );
}
