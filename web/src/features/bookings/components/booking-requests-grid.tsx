import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import InputAdornment from '@mui/material/InputAdornment';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import Search from '@mui/icons-material/Search';
import { DataGrid, type GridColDef, type GridRenderCellParams } from '@mui/x-data-grid';
import { useQuery } from '@tanstack/react-query';
import { DateTime } from 'luxon';
import { useMemo, useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { autoHeightGridSx } from '@/components/ui/data-grid-styles';
import { formatCents } from '@/lib/money';
import type { Booking, BookingState } from '@/types/api';
import { bookingsQueryOptions } from '../api/get-bookings';
import {
  filterBookings,
  moveRequested,
  needsMove,
  quickFilterLabels,
  type BookingQuickFilter,
} from '../utils/booking-filters';
import { bookingStateLabels, formatShortLocalDate, localDateOf } from '../utils/booking-text';
import { workshopToday } from '../utils/day-board';
import { BookingStateChip } from './booking-state-chip';

interface Props {
  /** Names the grid for assistive technology. */
  label: string;
  /** The workshop's IANA zone: every start is shown on its clock. */
  timeZone: string;
  hrefFor: (booking: Booking) => string;
}

const quickFilters: BookingQuickFilter[] = [
  'waiting',
  'move-requested',
  'needs-move',
  'today',
  'this-week',
  'all',
];
const states = Object.keys(bookingStateLabels) as BookingState[];

/** "Thu 3 Dec 7:30 am" on the workshop's clock. */
function startText(booking: Booking, timeZone: string): string {
  const local = DateTime.fromISO(booking.startUtc).setZone(timeZone).setLocale('en-AU');
  return `${formatShortLocalDate(localDateOf(booking.startUtc, timeZone))} ${local.toLocaleString(DateTime.TIME_SIMPLE)}`;
}

function columnsFor(
  timeZone: string,
  hrefFor: (booking: Booking) => string,
): GridColDef<Booking>[] {
  return [
    {
      field: 'reference',
      headerName: 'Booking',
      width: 112,
      renderCell: ({ row }: GridRenderCellParams<Booking>) => (
        <Link component={RouterLink} to={hrefFor(row)} onClick={(event) => event.stopPropagation()}>
          {row.reference}
        </Link>
      ),
    },
    {
      field: 'state',
      headerName: 'State',
      width: 130,
      type: 'singleSelect',
      valueOptions: states.map((state) => ({ value: state, label: bookingStateLabels[state] })),
      // The state, and under it what needs the desk: a move the revised quote forces, or the
      // customer's request to move.
      renderCell: ({ row }: GridRenderCellParams<Booking>) => (
        <Box
          sx={{
            display: 'flex',
            flexDirection: 'column',
            alignItems: 'flex-start',
            gap: 0.5,
            py: 0.75,
          }}
        >
          <BookingStateChip state={row.state} />
          {needsMove(row) && <Chip size="small" color="error" label="Needs a move" />}
          {moveRequested(row) && (
            <Chip size="small" color="warning" variant="outlined" label="Move requested" />
          )}
        </Box>
      ),
    },
    {
      field: 'startUtc',
      headerName: 'Start',
      width: 140,
      valueFormatter: (_value, row) => startText(row, timeZone),
    },
    {
      field: 'customer',
      headerName: 'Customer',
      flex: 1,
      minWidth: 160,
      valueGetter: (_value, row) => row.customer.name,
      renderCell: ({ row }: GridRenderCellParams<Booking>) => (
        <Box sx={{ lineHeight: 1.35, minWidth: 0, whiteSpace: 'normal' }}>
          <Box>{row.customer.name}</Box>
          <Box sx={{ color: 'text.secondary', overflowWrap: 'anywhere' }}>{row.customer.email}</Box>
        </Box>
      ),
    },
    {
      field: 'vehicle',
      headerName: 'Vehicle',
      flex: 1,
      minWidth: 140,
      valueGetter: (_value, row) => row.quote.vehicleName,
      renderCell: ({ value }: GridRenderCellParams<Booking, string>) => (
        <Box component="span" sx={{ whiteSpace: 'normal', lineHeight: 1.35 }}>
          {value}
        </Box>
      ),
    },
    {
      field: 'rego',
      headerName: 'Rego',
      width: 96,
      valueGetter: (_value, row) => row.rego ?? '',
    },
    {
      field: 'quote',
      headerName: 'Quote',
      width: 96,
      valueGetter: (_value, row) => row.quote.reference,
    },
    {
      field: 'depositPaidCents',
      headerName: 'Deposit paid',
      type: 'number',
      width: 108,
      valueFormatter: (value: number) => (value > 0 ? formatCents(value) : 'Not paid'),
    },
  ];
}

/**
 * Every booking as a table: quick views (waiting for confirmation, move requested, needs a
 * move, today, this week), a state, and a search by customer, rego, quote or booking reference.
 * A row opens the booking.
 */
export function BookingRequestsGrid({ label, timeZone, hrefFor }: Props) {
  const navigate = useNavigate();
  const bookings = useQuery(bookingsQueryOptions());
  const [quick, setQuick] = useState<BookingQuickFilter>('all');
  const [state, setState] = useState<BookingState | null>(null);
  const [search, setSearch] = useState('');
  const columns = useMemo(() => columnsFor(timeZone, hrefFor), [timeZone, hrefFor]);
  const today = workshopToday(timeZone);
  const rows = useMemo(
    () => filterBookings(bookings.data?.items ?? [], { quick, state, search, today, timeZone }),
    [bookings.data, quick, state, search, today, timeZone],
  );
  const items = bookings.data?.items ?? [];
  const counts: Partial<Record<BookingQuickFilter, number>> = {
    waiting: items.filter((b) => b.state === 'requested').length,
    'move-requested': items.filter(moveRequested).length,
    'needs-move': items.filter(needsMove).length,
  };

  return (
    <Box>
      <Box sx={{ display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: 1.5, mb: 1.5 }}>
        <Box role="group" aria-label="Show" sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.75 }}>
          {quickFilters.map((option) => {
            const selected = quick === option;
            const count = counts[option] ?? 0;
            return (
              <Chip
                key={option}
                label={
                  count > 0 ? `${quickFilterLabels[option]} (${count})` : quickFilterLabels[option]
                }
                clickable
                color={selected ? 'primary' : 'default'}
                variant={selected ? 'filled' : 'outlined'}
                aria-pressed={selected}
                onClick={() => setQuick(option)}
              />
            );
          })}
        </Box>
        <TextField
          select
          label="State"
          size="small"
          margin="none"
          value={state ?? ''}
          onChange={(event) => setState((event.target.value as BookingState) || null)}
          sx={{ width: 170 }}
        >
          <MenuItem value="">Any state</MenuItem>
          {states.map((option) => (
            <MenuItem key={option} value={option}>
              {bookingStateLabels[option]}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          type="search"
          label="Search bookings"
          placeholder="Name, e-mail, rego, Q-000123, B-000042"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
          margin="none"
          size="small"
          sx={{ flex: '1 1 260px', maxWidth: { sm: 360 } }}
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
      </Box>
      {bookings.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => bookings.refetch()}>
              Try again
            </Button>
          }
        >
          The bookings could not be loaded. {bookings.error.message}
        </Alert>
      ) : (
        <Box sx={{ '& .MuiDataGrid-row': { cursor: 'pointer' } }}>
          <DataGrid
            aria-label={label}
            rows={rows}
            columns={columns}
            loading={bookings.isFetching && !bookings.data}
            autoHeight
            disableRowSelectionOnClick
            getRowHeight={() => 'auto'}
            onRowClick={({ row }) => void navigate(hrefFor(row))}
            onCellKeyDown={({ row }, event) => {
              if (event.key === 'Enter') void navigate(hrefFor(row));
            }}
            pageSizeOptions={[25, 50, 100]}
            initialState={{ pagination: { paginationModel: { pageSize: 25, page: 0 } } }}
            localeText={{
              noRowsLabel:
                search || state || quick !== 'all' ? 'No bookings match.' : 'No bookings yet.',
            }}
            sx={autoHeightGridSx}
          />
        </Box>
      )}
    </Box>
  );
}
