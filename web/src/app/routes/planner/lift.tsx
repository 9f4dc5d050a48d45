/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { LiftStep } from '@/features/planner/components/lift-step';

export default function LiftRoute() {
  return (
    <PlannerStepGate step="lift">
      <LiftStep />
    </PlannerStepGate>
  );
}
