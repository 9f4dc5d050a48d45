/** A planner step page, shared by the customer's planner and the front desk's walk-in quote. */
import { PlannerStepGate } from '@/features/planner/components/planner-step-gate';
import { VehicleStep } from '@/features/planner/components/vehicle-step';

export default function VehicleRoute() {
  return (
    <PlannerStepGate step="vehicle">
      <VehicleStep />
    </PlannerStepGate>
  );
}
