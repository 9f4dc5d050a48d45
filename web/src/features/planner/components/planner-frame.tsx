import Box from '@mui/material/Box';
import type { ReactNode } from 'react';
import { usePlanner } from '../hooks/use-planner';
import { BuildSummary } from './build-summary';

/** The planner's page: the step on the left, the build so far on the right (wide screens). */
export function PlannerFrame({ children }: { children: ReactNode }) {
  const { build } = usePlanner();
  return (
    <Box
      sx={{
        display: 'grid',
        gap: 4,
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'minmax(0, 1fr) 260px' },
        alignItems: 'start',
        maxWidth: 1120,
      }}
    >
      <Box sx={{ minWidth: 0 }}>{children}</Box>
      <Box sx={{ display: { xs: 'none', md: 'block' }, alignSelf: 'stretch' }}>
        <BuildSummary build={build} />
      </Box>
    </Box>
  );
}
