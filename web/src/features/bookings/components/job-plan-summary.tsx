import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { JobPlan } from '@/types/api';
import {
  bayKindLabels,
  earliestStartText,
  formatWorkMinutes,
  jobSegmentsText,
} from '../utils/booking-text';

interface Props {
  plan: JobPlan;
  headingId?: string;
}

/**
 * What the job needs, in plain words: the bays in order with their working time, and the
 * earliest day it can start and why.
 */
export function JobPlanSummary({ plan, headingId }: Props) {
  if (plan.segments.length === 0) {
    return (
      <Typography>
        This quote has no workshop time on it, so there is no bay to book. Ask the workshop how they
        would like to fit it.
      </Typography>
    );
  }
  return (
    <Box sx={{ display: 'grid', gap: 1 }}>
      <Typography id={headingId} sx={{ fontWeight: 500, fontSize: '1.05rem' }}>
        {jobSegmentsText(plan.segments)}
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5, color: 'text.secondary' }}>
        {plan.segments.map((segment) => (
          <li key={segment.bayKind}>
            <Typography variant="body2" component="span">
              In the {bayKindLabels[segment.bayKind]} ({formatWorkMinutes(segment.minutes)}):{' '}
              {segment.descriptions.join('; ')}
            </Typography>
          </li>
        ))}
      </Box>
      <Typography variant="body2">
        {formatWorkMinutes(plan.totalMinutes)} of work in all. {earliestStartText(plan)}
      </Typography>
    </Box>
  );
}
