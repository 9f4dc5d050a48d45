/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { WheelsStep } from '@/features/planner/components/wheels-step';

export default function WheelsRoute() {
  return (
    <PlannerStepGate step="wheels">
      <WheelsStep />
    </PlannerStepGate>
  );
}
