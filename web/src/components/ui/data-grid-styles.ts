import type { SxProps, Theme } from '@mui/material/styles';

/**
 * The house look of a data grid whose rows grow to fit wrapped text (getRowHeight "auto"):
 * every cell's content centred vertically, with room above and below.
 */
export const autoHeightGridSx: SxProps<Theme> = {
  bgcolor: 'background.paper',
  '& .MuiDataGrid-cell': { display: 'flex', alignItems: 'center', py: 0.75 },
  '& .MuiDataGrid-columnHeaderTitle': { fontWeight: 500 },
};
