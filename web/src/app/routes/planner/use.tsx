/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { UseStep } from '@/features/planner/components/use-step';

export default function UseRoute() {
  return (
    <PlannerStepGate step="use">
      <UseStep />
    </PlannerStepGate>
  );
}
