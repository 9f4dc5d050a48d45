import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { alpha } from '@mui/material/styles';
import { Fragment, useId } from 'react';
import { Link as RouterLink } from 'react-router';
import type { Booking, WorkshopSetup } from '@/types/api';
import {
  bayKindLabels,
  bookingStateLabels,
  formatLocalDate,
  formatLocalRange,
  formatLocalTime,
} from '../utils/booking-text';
import {
  boardBays,
  boardWindow,
  clockText,
  dayStatus,
  placeSegments,
  ROW_MINUTES,
  rowKinds,
  type PlacedBlock,
} from '../utils/day-board';

interface Props {
  setup: WorkshopSetup;
  bookings: readonly Booking[];
  /** The workshop-local day shown, "YYYY-MM-DD". */
  date: string;
  hrefFor: (booking: Booking) => string;
}

const ROW_HEIGHT = 30;

/** One line of a block, cut with an ellipsis rather than wrapped (the full text is its name). */
function lineSx(fontWeight?: number) {
  return {
    fontWeight,
    whiteSpace: 'nowrap',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
  } as const;
}

/** What a block says, in one line for assistive technology. */
function blockLabel(block: PlacedBlock, timeZone: string): string {
  const { booking, segment } = block;
  const parts = [
    booking.reference,
    bookingStateLabels[booking.state],
    booking.customer.name,
    booking.quote.vehicleName,
    `quote ${booking.quote.reference}`,
    `${segment.bayName} ${formatLocalRange(segment.startUtc, segment.endUtc, timeZone)}`,
  ];
  if (booking.state === 'held' && booking.holdExpiresAt) {
    parts.push(`held until ${formatLocalTime(booking.holdExpiresAt, timeZone)}`);
  }
  return parts.join(', ');
}

function BoardBlock({
  block,
  column,
  timeZone,
  href,
}: {
  block: PlacedBlock;
  column: number;
  timeZone: string;
  href: string;
}) {
  const { booking, segment } = block;
  const held = booking.state === 'held';
  const rows = block.rowEnd - block.rowStart;
  return (
    <Box
      component={RouterLink}
      to={href}
      aria-label={blockLabel(block, timeZone)}
      sx={(theme) => ({
        gridColumn: column,
        gridRow: `${block.rowStart + 2} / ${block.rowEnd + 2}`,
        zIndex: 1,
        m: '2px',
        px: 0.75,
        py: 0.25,
        borderRadius: 1,
        overflow: 'hidden',
        textDecoration: 'none',
        color: 'text.primary',
        fontSize: '0.75rem',
        lineHeight: 1.25,
        display: 'flex',
        flexDirection: 'column',
        bgcolor: held
          ? theme.palette.background.paper
          : alpha(
              booking.state === 'requested' ? theme.palette.info.main : theme.palette.primary.main,
              0.12,
            ),
        border: '2px solid',
        borderStyle: held ? 'dashed' : 'solid',
        borderColor: held
          ? theme.palette.warning.dark
          : booking.state === 'requested'
            ? theme.palette.info.dark
            : theme.palette.primary.main,
        borderTopLeftRadius: block.continuesFromBefore ? 0 : undefined,
        borderTopRightRadius: block.continuesFromBefore ? 0 : undefined,
        '&:hover': { boxShadow: theme.shadows[3] },
        '&:focus-visible': {
          outline: `3px solid ${theme.palette.secondary.main}`,
          outlineOffset: 1,
        },
      })}
    >
      <Box component="span" sx={lineSx(700)}>
        {booking.customer.name}
      </Box>
      <Box component="span" sx={lineSx()}>
        {booking.quote.vehicleName}
      </Box>
      <Box component="span" sx={{ ...lineSx(), color: held ? 'warning.dark' : 'text.secondary' }}>
        {booking.quote.reference} ·{' '}
        {held && booking.holdExpiresAt
          ? `Held until ${formatLocalTime(booking.holdExpiresAt, timeZone)}`
          : bookingStateLabels[booking.state]}
      </Box>
      {rows > 2 && (
        <Box component="span" sx={{ ...lineSx(), color: 'text.secondary' }}>
          {formatLocalRange(segment.startUtc, segment.endUtc, timeZone)}
        </Box>
      )}
    </Box>
  );
}

/**
 * One day of the workshop: bays as columns (their kind under the name), working time as rows
 * of 30 minutes with the break shaded, each stay of a booking a block in its bay. Holds are
 * drawn with a dashed outline; a closed day says why.
 */
export function DayBoard({ setup, bookings, date, hrefFor }: Props) {
  const headingId = useId();
  const { timeZone } = setup;
  const status = dayStatus(date, setup);
  const hoursWindow = boardWindow(setup.openingHours);
  const blocks = hoursWindow ? placeSegments(bookings, date, timeZone, hoursWindow) : [];
  const bays = boardBays(setup.bays, blocks);
  const kinds = hoursWindow ? rowKinds(hoursWindow, status.hours) : [];

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Typography id={headingId} variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
        {formatLocalDate(date, true)}
      </Typography>
      {!status.open && (
        <Alert severity="info" role="note" sx={{ mb: 2 }}>
          <strong>{status.reason}</strong>
          {blocks.length > 0 ? ' Some work still sits in a bay on this day.' : ''}
        </Alert>
      )}
      {!hoursWindow || bays.length === 0 ? (
        <Alert severity="warning">
          {bays.length === 0
            ? 'The workshop has no active bay. A manager adds bays under Manage → Workshop.'
            : 'The workshop has no opening hours set.'}
        </Alert>
      ) : status.open || blocks.length > 0 ? (
        <Box sx={{ overflowX: 'auto' }}>
          <Box
            sx={{
              display: 'grid',
              gridTemplateColumns: `64px repeat(${bays.length}, minmax(150px, 1fr))`,
              gridTemplateRows: `auto repeat(${hoursWindow.rows}, ${ROW_HEIGHT}px)`,
              minWidth: 64 + bays.length * 150,
              border: 1,
              borderColor: 'divider',
              borderRadius: 1,
              bgcolor: 'background.paper',
            }}
          >
            <Box sx={{ gridColumn: 1, gridRow: 1, borderBottom: 1, borderColor: 'divider' }} />
            {bays.map((bay, index) => (
              <Box
                key={bay.id}
                sx={{
                  gridColumn: index + 2,
                  gridRow: 1,
                  px: 1,
                  py: 0.75,
                  borderBottom: 1,
                  borderLeft: 1,
                  borderColor: 'divider',
                }}
              >
                <Typography component="div" sx={{ fontWeight: 700 }}>
                  {bay.name}
                </Typography>
                <Typography component="div" variant="body2" color="text.secondary">
                  {bayKindLabels[bay.kind]}
                  {bay.active ? '' : ' · switched off'}
                </Typography>
              </Box>
            ))}
            {kinds.map((kind, row) => {
              const minute = hoursWindow.startMinute + row * ROW_MINUTES;
              return (
                <Fragment key={row}>
                  <Box
                    sx={{
                      gridColumn: 1,
                      gridRow: row + 2,
                      px: 1,
                      fontSize: '0.75rem',
                      color: 'text.secondary',
                      borderTop: minute % 60 === 0 ? 1 : 0,
                      borderColor: 'divider',
                    }}
                  >
                    {minute % 60 === 0 || row === 0 ? clockText(minute) : ''}
                    {kind === 'break' && row > 0 && kinds[row - 1] !== 'break' ? (
                      <Box component="span" sx={{ display: 'block' }}>
                        Break
                      </Box>
                    ) : null}
                  </Box>
                  <Box
                    aria-hidden
                    sx={(theme) => ({
                      gridColumn: `2 / span ${bays.length}`,
                      gridRow: row + 2,
                      borderTop: 1,
                      borderColor:
                        minute % 60 === 0 ? 'divider' : alpha(theme.palette.divider, 0.4),
                      bgcolor:
                        kind === 'break'
                          ? alpha(theme.palette.text.primary, 0.08)
                          : kind === 'closed'
                            ? alpha(theme.palette.text.primary, 0.04)
                            : undefined,
                      backgroundImage:
                        kind === 'break'
                          ? `repeating-linear-gradient(45deg, transparent 0 6px, ${alpha(theme.palette.text.primary, 0.06)} 6px 12px)`
                          : undefined,
                    })}
                  />
                </Fragment>
              );
            })}
            {blocks.map((block) => {
              const column = bays.findIndex((bay) => bay.id === block.segment.bayId);
              if (column < 0) return null;
              return (
                <BoardBlock
                  key={`${block.booking.id}-${block.segment.bayId}-${block.segment.startUtc}`}
                  block={block}
                  column={column + 2}
                  timeZone={timeZone}
                  href={hrefFor(block.booking)}
                />
              );
            })}
          </Box>
        </Box>
      ) : null}
      {hoursWindow && status.open && blocks.length === 0 && (
        <Typography color="text.secondary" sx={{ mt: 1.5 }}>
          No bookings on this day yet.
        </Typography>
      )}
      {(status.open || blocks.length > 0) && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
          Times are the workshop&apos;s local time ({timeZone.replace(/_/g, ' ')}). Dashed outline:
          a time held while the customer pays the deposit.
        </Typography>
      )}
    </Box>
  );
}
