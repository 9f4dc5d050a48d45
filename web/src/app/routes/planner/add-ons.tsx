/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { AddOnsStep } from '@/features/planner/components/add-ons-step';

export default function AddOnsRoute() {
  return (
    <PlannerStepGate step="add-ons">
      <AddOnsStep />
    </PlannerStepGate>
  );
}
