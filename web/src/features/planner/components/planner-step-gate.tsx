import type { ReactNode } from 'react';
import { Navigate } from 'react-router';
import { canOpenStep, firstOpenStep, type StepId } from '../forms/build';
import { usePlanner } from '../hooks/use-planner';

interface Props {
  step: StepId;
  children: ReactNode;
}

/** Opens a step only once the steps before it are done; otherwise goes to the first open one. */
export function PlannerStepGate({ step, children }: Props) {
  const { build, config, stepHref } = usePlanner();
  const customerHref = config.customerStepHref;
  if (customerHref && !build.customer) return <Navigate to={customerHref} replace />;
  if (!canOpenStep(build, step)) return <Navigate to={stepHref(firstOpenStep(build))} replace />;
  return children;
}

/** The planner's own address ("/plan") opens the first step not done yet. */
export function PlannerStartRedirect() {
  const { build, config, stepHref } = usePlanner();
  const customerHref = config.customerStepHref;
  if (customerHref && !build.customer) return <Navigate to={customerHref} replace />;
  return <Navigate to={stepHref(firstOpenStep(build))} replace />;
}
