import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
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
import { useId, useMemo, useState } from 'react';
import { autoHeightGridSx } from '@/components/ui/data-grid-styles';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { formatCents } from '@/lib/money';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { Product, ProductKind, ProductWithFit } from '@/types/api';
import { productsQueryOptions } from '../api/get-products';
import { kindLabels, kindPluralLabels, productKinds } from '../forms/product-fields';

interface Props {
  /** Names the grid (the id of the heading above it). */
  labelledBy: string;
  onEdit: (product: Product) => void;
}

/** On a phone the grid shows one "Product" column (name, SKU, stock) with its price. */
const phoneColumns: GridColumnVisibilityModel = {
  product: true,
  sku: false,
  kind: false,
  name: false,
  brand: false,
  priceCents: true,
  labourMinutes: false,
  stockQty: false,
  leadDays: false,
  active: false,
  edit: true,
};

const wideColumns: GridColumnVisibilityModel = {
  product: false,
  sku: true,
  kind: true,
  name: true,
  brand: true,
  priceCents: true,
  labourMinutes: true,
  stockQty: true,
  leadDays: true,
  active: true,
  edit: true,
};

/** Cell text that wraps onto more lines instead of being cut off (rows grow to fit). */
function wrapped(text: string) {
  return (
    <Box component="span" sx={{ whiteSpace: 'normal', overflowWrap: 'anywhere', lineHeight: 1.4 }}>
      {text}
    </Box>
  );
}

function columnsFor(onEdit: (product: Product) => void): GridColDef<ProductWithFit>[] {
  return [
    {
      field: 'product',
      headerName: 'Product',
      flex: 1,
      minWidth: 160,
      valueGetter: (_value, row) => row.name,
      renderCell: ({ row }: GridRenderCellParams<ProductWithFit>) => (
        <Box sx={{ lineHeight: 1.35, minWidth: 0 }}>
          <Typography variant="body2" sx={{ fontWeight: 500, whiteSpace: 'normal' }}>
            {row.name}
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ whiteSpace: 'normal' }}>
            {row.sku} · {row.stockQty} in stock{row.active ? '' : ' · inactive'}
          </Typography>
        </Box>
      ),
    },
    {
      field: 'sku',
      headerName: 'SKU',
      width: 132,
      renderCell: ({ value }: GridRenderCellParams<ProductWithFit, string>) => wrapped(value ?? ''),
    },
    {
      field: 'kind',
      headerName: 'Kind',
      width: 112,
      type: 'singleSelect',
      valueOptions: productKinds.map((kind) => ({ value: kind, label: kindLabels[kind] })),
    },
    {
      field: 'name',
      headerName: 'Name',
      flex: 1,
      minWidth: 150,
      renderCell: ({ value }: GridRenderCellParams<ProductWithFit, string>) => wrapped(value ?? ''),
    },
    {
      field: 'brand',
      headerName: 'Brand',
      width: 104,
      renderCell: ({ value }: GridRenderCellParams<ProductWithFit, string>) => wrapped(value ?? ''),
    },
    {
      field: 'priceCents',
      headerName: 'Price',
      type: 'number',
      width: 96,
      valueFormatter: (value: number) => formatCents(value),
    },
    {
      field: 'labourMinutes',
      headerName: 'Labour',
      description: 'Labour, minutes',
      type: 'number',
      width: 80,
      valueFormatter: (value: number) => `${value} min`,
    },
    { field: 'stockQty', headerName: 'Stock', type: 'number', width: 64 },
    {
      field: 'leadDays',
      headerName: 'Lead time',
      description: 'Days to get it in when out of stock',
      type: 'number',
      width: 84,
      valueFormatter: (value: number) => `${value} day${value === 1 ? '' : 's'}`,
    },
    { field: 'active', headerName: 'Active', type: 'boolean', width: 64 },
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
      renderCell: ({ row }: GridRenderCellParams<ProductWithFit>) => (
        <Button
          size="small"
          variant="outlined"
          aria-label={`Edit ${row.sku}`}
          onClick={() => onEdit(row)}
          sx={{ minWidth: 0, px: 1.5 }}
        >
          Edit
        </Button>
      ),
    },
  ];
}

/** The catalogue as a sortable, filterable, paged grid, with search and a kind filter. */
export function CatalogueGrid({ labelledBy, onEdit }: Props) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const searchId = useId();
  const [search, setSearch] = useState('');
  const [kind, setKind] = useState<ProductKind | null>(null);
  const q = useDebouncedValue(search.trim(), 300);
  const products = useQuery({
    ...productsQueryOptions({ includeInactive: true, kind: kind ?? undefined, q: q || undefined }),
    placeholderData: keepPreviousData,
  });
  const columns = useMemo(() => columnsFor(onEdit), [onEdit]);
  // Each screen width has its own column set; changes made in the columns menu are kept per width.
  const [chosenColumns, setChosenColumns] = useState<{
    phone?: GridColumnVisibilityModel;
    wide?: GridColumnVisibilityModel;
  }>({});
  const width = phone ? 'phone' : 'wide';
  const visibility = chosenColumns[width] ?? (phone ? phoneColumns : wideColumns);

  return (
    <Box>
      <Box
        sx={{
          display: 'flex',
          flexWrap: 'wrap',
          alignItems: 'center',
          gap: 1.5,
          mb: 1.5,
        }}
      >
        <TextField
          id={searchId}
          type="search"
          label="Search products"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
          margin="none"
          size="small"
          helperText={undefined}
          sx={{ flex: '1 1 220px', maxWidth: { sm: 320 } }}
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
        <Box
          role="group"
          aria-label="Filter by kind"
          sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.75 }}
        >
          {[null, ...productKinds].map((option) => {
            const selected = kind === option;
            return (
              <Chip
                key={option ?? 'all'}
                label={option ? kindPluralLabels[option] : 'All kinds'}
                clickable
                color={selected ? 'primary' : 'default'}
                variant={selected ? 'filled' : 'outlined'}
                aria-pressed={selected}
                onClick={() => setKind(option)}
              />
            );
          })}
        </Box>
      </Box>

      {products.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => products.refetch()}>
              Try again
            </Button>
          }
        >
          The catalogue could not be loaded. {products.error.message}
        </Alert>
      ) : (
        <DataGrid
          aria-labelledby={labelledBy}
          rows={products.data?.items ?? []}
          columns={columns}
          loading={products.isFetching}
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
            sorting: { sortModel: [{ field: 'sku', sort: 'asc' }] },
          }}
          localeText={{ noRowsLabel: q || kind ? 'No products match.' : 'No products yet.' }}
          sx={autoHeightGridSx}
        />
      )}
    </Box>
  );
}
