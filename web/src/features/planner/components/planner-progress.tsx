import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import Step from '@mui/material/Step';
import StepButton from '@mui/material/StepButton';
import StepLabel from '@mui/material/StepLabel';
import Stepper from '@mui/material/Stepper';
import { useNavigate } from 'react-router';
import {
  bookStep,
  canOpenStep,
  progressSteps,
  stepIndex,
  stepTitle,
  type ProgressStepId,
} from '../forms/build';
import { usePlanner } from '../hooks/use-planner';

/**
 * Where the user is in the planner: a bar on phones, the named steps on wide screens (steps
 * already reachable can be opened from there). In the customer's planner the booking follows
 * the review: it opens from a saved quote, so the progress shows it without a way into it, and
 * on the booking the build's steps are shown done (the quote is saved).
 */
export function PlannerProgress({ step }: { step: ProgressStepId }) {
  const { build, config, stepHref } = usePlanner();
  const navigate = useNavigate();
  const steps = progressSteps(config.mode);
  const index = stepIndex(step);
  const total = steps.length;
  const text = `Step ${index + 1} of ${total} — ${stepTitle(step)}`;
  const booking = step === bookStep.id;

  return (
    <>
      <LinearProgress
        variant="determinate"
        value={((index + 1) / total) * 100}
        aria-label="Progress through the planner"
        aria-valuetext={text}
        sx={{ display: { md: 'none' }, height: 6, borderRadius: 3, mb: 1 }}
      />
      <Box
        component="nav"
        aria-label="Planner steps"
        sx={{ display: { xs: 'none', md: 'block' }, mb: 2 }}
      >
        <Stepper nonLinear activeStep={index} alternativeLabel>
          {steps.map((candidate) => {
            const current = candidate.id === step;
            const buildStep = candidate.id !== bookStep.id ? candidate.id : null;
            const reachable = !booking && buildStep !== null && canOpenStep(build, buildStep);
            const done = booking
              ? !current
              : buildStep !== null && build.completed.includes(buildStep);
            return (
              <Step
                key={candidate.id}
                completed={done && !current}
                disabled={!reachable && !current && !done}
              >
                {reachable && !current && buildStep ? (
                  <StepButton onClick={() => void navigate(stepHref(buildStep))}>
                    {candidate.title}
                  </StepButton>
                ) : (
                  <StepLabel aria-current={current ? 'step' : undefined}>
                    {candidate.title}
                  </StepLabel>
                )}
              </Step>
            );
          })}
        </Stepper>
      </Box>
    </>
  );
}
