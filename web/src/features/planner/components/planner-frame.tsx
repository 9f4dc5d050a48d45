import Box from '@mui/material/Box';
import type { ReactNode } from 'react';
import { usePlanner } from '../hooks/use-planner';
import { BuildSummary } from './build-summary';

interface Props {
  children: ReactNode;
  /**
   * Shows the build so far beside the step (the default). Off on the booking step: the build
   * is a saved quote by then, and the step uses the whole width for the calendar.
   */
  showBuild?: boolean;
}

/** The planner's page: the step on the left, the build so far on the right (wide screens). */
export function PlannerFrame({ children, showBuild = true }: Props) {
  const { build } = usePlanner();
  return (
    <Box
      sx={{
        display: 'grid',
        gap: 4,
        gridTemplateColumns: {
          xs: 'minmax(0, 1fr)',
          md: showBuild ? 'minmax(0, 1fr) 260px' : 'minmax(0, 1fr)',
        },
        alignItems: 'start',
        maxWidth: 1120,
      }}
    >
      <Box sx={{ minWidth: 0 }}>{children}</Box>
      {showBuild && (
        <Box sx={{ display: { xs: 'none', md: 'block' }, alignSelf: 'stretch' }}>
          <BuildSummary build={build} />
        </Box>
      )}
    </Box>
  );
}
