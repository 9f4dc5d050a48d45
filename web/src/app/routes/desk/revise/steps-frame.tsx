import { Outlet } from 'react-router';
import { PlannerFrame } from '@/features/planner/components/planner-frame';
import { RevisionBanner } from '@/features/planner/components/revision-banner';

/** The revision's planner steps, under a banner naming the quote and the customer. */
export default function ReviseStepsFrameRoute() {
  return (
    <>
      <RevisionBanner />
      <PlannerFrame>
        <Outlet />
      </PlannerFrame>
    </>
  );
}
