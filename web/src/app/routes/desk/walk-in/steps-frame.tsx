import { Outlet } from 'react-router';
import { paths } from '@/config/paths';
import { PlannerCustomerBanner } from '@/features/planner/components/customer-banner';
import { PlannerFrame } from '@/features/planner/components/planner-frame';

/** The walk-in's planner steps, under a banner naming the customer. */
export default function WalkInStepsFrameRoute() {
  return (
    <>
      <PlannerCustomerBanner changeHref={paths.desk.walkIn.step('customer')} />
      <PlannerFrame>
        <Outlet />
      </PlannerFrame>
    </>
  );
}
