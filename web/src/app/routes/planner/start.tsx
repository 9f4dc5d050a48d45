/** The planner's own address opens the first step not done yet. */
import { PlannerStartRedirect } from '@/features/planner/components/planner-step-gate';

export default function StartRoute() {
  return <PlannerStartRedirect />;
}
