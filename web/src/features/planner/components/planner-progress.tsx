import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import Step from '@mui/material/Step';
import StepButton from '@mui/material/StepButton';
import StepLabel from '@mui/material/StepLabel';
import Stepper from '@mui/material/Stepper';
import { useNavigate } from 'react-router';
import { canOpenStep, plannerSteps, stepIndex, stepTitle, type StepId } from '../forms/build';
import { usePlanner } from '../hooks/use-planner';

/**
 * Where the user is in the planner: a bar on phones, the named steps on wide screens (steps
 * already reachable can be opened from there).
 */
export function PlannerProgress({ step }: { step: StepId }) {
  const { build, stepHref } = usePlanner();
  const navigate = useNavigate();
  const index = stepIndex(step);
  const total = plannerSteps.length;
  const text = `Step ${index + 1} of ${total} — ${stepTitle(step)}`;

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
          {plannerSteps.map((candidate) => {
            const reachable = canOpenStep(build, candidate.id);
            const done = build.completed.includes(candidate.id);
            const current = candidate.id === step;
            return (
              <Step key={candidate.id} completed={done && !current} disabled={!reachable}>
                {reachable && !current ? (
                  <StepButton onClick={() => void navigate(stepHref(candidate.id))}>
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
