import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import InputAdornment from '@mui/material/InputAdornment';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import Search from '@mui/icons-material/Search';
import {
  DataGrid,
  type GridColDef,
  type GridColumnVisibilityModel,
  type GridRenderCellParams,
} from '@mui/x-data-grid';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { autoHeightGridSx } from '@/components/ui/data-grid-styles';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { VehicleModel } from '@/types/api';
import { vehicleModelsQueryOptions } from '../api/get-vehicle-models';
import {
  frontSuspensionLabels,
  rearSuspensionLabels,
  vehicleName,
  yearsText,
} from '../forms/vehicle-model-fields';

interface Props {
  /** Names the grid (the id of the heading above it). */
  labelledBy: string;
  onEdit: (vehicle: VehicleModel) => void;
}

const phoneColumns: GridColumnVisibilityModel = {
  vehicle: true,
  make: false,
  model: false,
  variant: false,
  years: false,
  frontSuspension: false,
  rearSuspension: false,
  boltPattern: false,
  stockTyre: false,
  gvmKg: false,
  edit: true,
};

const wideColumns: GridColumnVisibilityModel = {
  vehicle: false,
  make: true,
  model: true,
  variant: true,
  years: true,
  frontSuspension: true,
  rearSuspension: true,
  boltPattern: true,
  stockTyre: true,
  gvmKg: true,
  edit: true,
};

/** Cell text that wraps onto more lines instead of being cut off (rows grow to fit). */
function wrappedCell({ formattedValue }: GridRenderCellParams<VehicleModel>) {
  return (
    <Box component="span" sx={{ whiteSpace: 'normal', overflowWrap: 'anywhere', lineHeight: 1.4 }}>
      {String(formattedValue ?? '')}
    </Box>
  );
}

function columnsFor(onEdit: (vehicle: VehicleModel) => void): GridColDef<VehicleModel>[] {
  return [
    {
      field: 'vehicle',
      headerName: 'Vehicle',
      flex: 1,
      minWidth: 180,
      valueGetter: (_value, row) => vehicleName(row),
      renderCell: ({ row }: GridRenderCellParams<VehicleModel>) => (
        <Box sx={{ lineHeight: 1.35, minWidth: 0 }}>
          <Typography variant="body2" sx={{ fontWeight: 500, whiteSpace: 'normal' }}>
            {vehicleName(row)} ({yearsText(row)})
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ whiteSpace: 'normal' }}>
            {frontSuspensionLabels[row.frontSuspension]} front ·{' '}
            {rearSuspensionLabels[row.rearSuspension].toLowerCase()} · {row.boltPattern} ·{' '}
            {row.stockTyre} · GVM {row.gvmKg} kg
          </Typography>
        </Box>
      ),
    },
    { field: 'make', headerName: 'Make', width: 100, renderCell: wrappedCell },
    { field: 'model', headerName: 'Model', width: 92, renderCell: wrappedCell },
    { field: 'variant', headerName: 'Variant', flex: 1, minWidth: 110, renderCell: wrappedCell },
    {
      field: 'years',
      headerName: 'Years',
      width: 104,
      valueGetter: (_value, row) => row.yearFrom,
      renderCell: ({ row }: GridRenderCellParams<VehicleModel>) => yearsText(row),
    },
    {
      field: 'frontSuspension',
      headerName: 'Front',
      description: 'Front suspension',
      width: 100,
      type: 'singleSelect',
      valueOptions: Object.entries(frontSuspensionLabels).map(([value, label]) => ({
        value,
        label,
      })),
    },
    {
      field: 'rearSuspension',
      headerName: 'Rear',
      description: 'Rear suspension',
      width: 104,
      type: 'singleSelect',
      valueOptions: Object.entries(rearSuspensionLabels).map(([value, label]) => ({
        value,
        label,
      })),
    },
    { field: 'boltPattern', headerName: 'Bolt pattern', width: 92, renderCell: wrappedCell },
    {
      field: 'stockTyre',
      headerName: 'Stock tyre',
      flex: 1,
      minWidth: 120,
      renderCell: wrappedCell,
    },
    {
      field: 'gvmKg',
      headerName: 'GVM (kg)',
      type: 'number',
      width: 80,
    },
    {
      field: 'edit',
      headerName: 'Actions',
      width: 84,
      sortable: false,
      filterable: false,
      disableColumnMenu: true,
      hideable: false,
      renderHeader: () => (
        <Box component="span" sx={visuallyHidden}>
          Actions
        </Box>
      ),
      renderCell: ({ row }: GridRenderCellParams<VehicleModel>) => (
        <Button
          size="small"
          variant="outlined"
          aria-label={`Edit ${vehicleName(row)}`}
          onClick={() => onEdit(row)}
          sx={{ minWidth: 0, px: 1.5 }}
        >
          Edit
        </Button>
      ),
    },
  ];
}

/** Every vehicle model's spec sheet as a sortable, filterable, paged grid with a search. */
export function VehicleModelsGrid({ labelledBy, onEdit }: Props) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const [search, setSearch] = useState('');
  const q = useDebouncedValue(search.trim(), 300);
  const vehicles = useQuery({
    ...vehicleModelsQueryOptions({ q: q || undefined }),
    placeholderData: keepPreviousData,
  });
  const columns = useMemo(() => columnsFor(onEdit), [onEdit]);
  const [chosenColumns, setChosenColumns] = useState<{
    phone?: GridColumnVisibilityModel;
    wide?: GridColumnVisibilityModel;
  }>({});
  const width = phone ? 'phone' : 'wide';
  const visibility = chosenColumns[width] ?? (phone ? phoneColumns : wideColumns);

  return (
    <Box>
      <TextField
        type="search"
        label="Search vehicles"
        value={search}
        onChange={(event) => setSearch(event.target.value)}
        margin="none"
        size="small"
        sx={{ mb: 1.5, maxWidth: { sm: 320 } }}
        slotProps={{
          input: {
            startAdornment: (
              <InputAdornment position="start">
                <Search fontSize="small" aria-hidden />
              </InputAdornment>
            ),
          },
        }}
      />
      {vehicles.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => vehicles.refetch()}>
              Try again
            </Button>
          }
        >
          The vehicle list could not be loaded. {vehicles.error.message}
        </Alert>
      ) : (
        <DataGrid
          aria-labelledby={labelledBy}
          rows={vehicles.data?.items ?? []}
          columns={columns}
          loading={vehicles.isFetching}
          autoHeight
          disableRowSelectionOnClick
          columnVisibilityModel={visibility}
          onColumnVisibilityModelChange={(model) =>
            setChosenColumns((chosen) => ({ ...chosen, [width]: model }))
          }
          getRowHeight={() => 'auto'}
          pageSizeOptions={[25, 50, 100]}
          initialState={{
            pagination: { paginationModel: { pageSize: 25, page: 0 } },
            sorting: { sortModel: [{ field: 'make', sort: 'asc' }] },
          }}
          localeText={{ noRowsLabel: q ? 'No vehicles match.' : 'No vehicles yet.' }}
          sx={autoHeightGridSx}
        />
      )}
    </Box>
  );
}
