import { LandingCard } from '@/components/ui/landing-card';
import { PageHeader } from '@/components/ui/page-header';
import { useUser } from '@/features/auth/hooks/use-user';

export default function WorkshopHomeRoute() {
  const { data: user } = useUser();
  return (
    <>
      <PageHeader title="Workshop" lead={user ? `Signed in as ${user.name}.` : undefined} />
      <LandingCard
        title="No jobs assigned yet"
        status="Your jobs for today will appear here."
        upcoming={[
          'The jobs assigned to you, in bay order',
          'The job card: checklist, ride height and alignment before and after, photos',
          'Mark the work done when the road test is finished',
        ]}
      />
    </>
  );
}
