/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { ReviewStep } from '@/features/planner/components/review-step';

export default function ReviewRoute() {
  return (
    <PlannerStepGate step="review">
      <ReviewStep />
    </PlannerStepGate>
  );
}
