import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import ArrowBack from '@mui/icons-material/ArrowBack';
import ArrowForward from '@mui/icons-material/ArrowForward';
import { useEffect, useRef, type ReactNode } from 'react';
import { useLocation, useNavigate } from 'react-router';
import { DocumentTitle } from '@/components/ui/document-title';
import {
  bookStep,
  progressSteps,
  stepIds,
  stepIndex,
  stepTitle,
  type ProgressStepId,
} from '../forms/build';
import { usePlanner } from '../hooks/use-planner';
import { PlannerProgress } from './planner-progress';
import { StartAgainButton } from './start-again-button';

interface Props {
  step: ProgressStepId;
  /** A line under the heading. */
  lead?: ReactNode;
  children: ReactNode;
  /**
   * Runs when "Next" is pressed: return false to stay (the step shows why). The step is then
   * marked done and the next one opens.
   */
  onNext?: () => boolean;
  /** Shown above the buttons, e.g. why "Next" cannot go on yet. */
  footerMessage?: ReactNode;
  /** Replaces the "Next" button (the review step's "Save quote"). */
  primaryAction?: ReactNode;
  /** Where "Back" goes instead of the step before (the booking goes back to its quote). */
  backHref?: string;
  /** The Back button's words, when it goes somewhere other than the step before. */
  backLabel?: string;
}

/**
 * The frame of one planner step: progress, the step's heading (which takes focus when the step
 * changes, so keyboard and screen-reader users start there), the content, then Back and Next.
 */
export function PlannerStep({
  step,
  lead,
  children,
  onNext,
  footerMessage,
  primaryAction,
  backHref: backHrefOverride,
  backLabel = 'Back',
}: Props) {
  const { config, stepHref, completeStep, openedOnKey } = usePlanner();
  const navigate = useNavigate();
  const { key } = useLocation();
  const headingRef = useRef<HTMLHeadingElement>(null);
  const index = stepIndex(step);
  const booking = step === bookStep.id;
  // The booking is reached from a saved quote, not with "Next": it has no step before or after.
  const previous = !booking && index > 0 ? stepIds[index - 1] : null;
  const next = !booking && index < stepIds.length - 1 ? stepIds[index + 1] : null;
  const backHref =
    backHrefOverride ??
    (previous ? stepHref(previous) : booking ? null : (config.firstStepBackHref ?? null));

  useEffect(() => {
    // The first step shown after opening the planner leaves focus where the browser put it.
    if (key !== openedOnKey) headingRef.current?.focus({ preventScroll: false });
  }, [key, openedOnKey]);

  const goNext = () => {
    if (booking || (onNext && !onNext())) return;
    completeStep(step);
    if (next) void navigate(stepHref(next));
  };

  return (
    <Box component="section" aria-labelledby={`planner-step-${step}`}>
      <DocumentTitle
        title={`${stepTitle(step)} · ${config.mode === 'revise' ? 'Revise the quote' : 'Plan your build'}`}
      />
      <PlannerProgress step={step} />
      <Box
        sx={{
          display: 'flex',
          alignItems: 'center',
          justifyContent: 'space-between',
          gap: 1,
          mb: 0.5,
        }}
      >
        <Typography variant="overline" component="p" color="text.secondary">
          Step {index + 1} of {progressSteps(config.mode).length}
        </Typography>
        {/* The build is a saved quote by now: nothing to start again. */}
        {!booking && <StartAgainButton />}
      </Box>
      <Typography
        id={`planner-step-${step}`}
        ref={headingRef}
        variant="h1"
        tabIndex={-1}
        data-route-focus=""
        sx={{ outline: 'none', '&:focus-visible': { outline: 'none' } }}
      >
        {stepTitle(step)}
      </Typography>
      {lead && (
        <Typography color="text.secondary" sx={{ mt: 0.75 }}>
          {lead}
        </Typography>
      )}
      <Box sx={{ mt: 3, display: 'grid', gap: 3, gridTemplateColumns: 'minmax(0, 1fr)' }}>
        {children}
      </Box>
      <Box sx={{ mt: 4 }}>
        {footerMessage && (
          <Alert severity="error" sx={{ mb: 2 }}>
            {footerMessage}
          </Alert>
        )}
        <Box
          sx={{
            display: 'flex',
            gap: 1.5,
            justifyContent: 'space-between',
            flexWrap: 'wrap-reverse',
          }}
        >
          {backHref ? (
            <Button
              variant="outlined"
              size="large"
              startIcon={<ArrowBack aria-hidden />}
              onClick={() => void navigate(backHref)}
            >
              {backLabel}
            </Button>
          ) : (
            <span />
          )}
          {primaryAction ??
            (next && (
              <Button
                variant="contained"
                size="large"
                endIcon={<ArrowForward aria-hidden />}
                onClick={goNext}
              >
                Next
              </Button>
            ))}
        </Box>
      </Box>
    </Box>
  );
}
