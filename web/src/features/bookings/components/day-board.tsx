import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { alpha, type Theme } from '@mui/material/styles';
import { useId } from 'react';
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
  BLOCK_METRICS,
  boardBays,
  boardHeightPx,
  boardWindow,
  clockText,
  dayBands,
  dayStatus,
  layoutBlocks,
  placeSegments,
  rowLines,
  type LaidOutBlock,
  type PlacedBlock,
} from '../utils/day-board';

interface Props {
  setup: WorkshopSetup;
  bookings: readonly Booking[];
  /** The workshop-local day shown, "YYYY-MM-DD". */
  date: string;
  hrefFor: (booking: Booking) => string;
}

/** The time column on the left. */
const GUTTER_PX = 64;

/** The time column stays in view while the bays scroll sideways (on a phone). */
const stickyGutterSx = {
  position: 'sticky',
  left: 0,
  zIndex: 3,
  bgcolor: 'background.paper',
  borderTopLeftRadius: 4,
} as const;

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
    ...(segment.work.length > 0 ? [`work: ${segment.work.join(', ')}`] : []),
  ];
  if (booking.state === 'held' && booking.holdExpiresAt) {
    parts.push(`held until ${formatLocalTime(booking.holdExpiresAt, timeZone)}`);
  }
  if (booking.arrivedAt) parts.push('vehicle arrived');
  return parts.join(', ');
}

function BoardBlock({
  block,
  timeZone,
  href,
}: {
  block: LaidOutBlock;
  timeZone: string;
  href: string;
}) {
  const { booking, segment, box } = block;
  const held = booking.state === 'held';
  // A block of one line only (a short stay with the next one right after it) drops its padding.
  const tight = box.heightPx < BLOCK_METRICS.chromePx + BLOCK_METRICS.lineHeightPx;
  const stateLine =
    held && booking.holdExpiresAt
      ? `Held until ${formatLocalTime(booking.holdExpiresAt, timeZone)}`
      : `${bookingStateLabels[booking.state]}${booking.arrivedAt ? ' · arrived' : ''}`;
  const tintOf = (theme: Theme) =>
    alpha(
      booking.state === 'requested' ? theme.palette.info.main : theme.palette.primary.main,
      0.12,
    );
  return (
    <Box
      component={RouterLink}
      to={href}
      aria-label={blockLabel(block, timeZone)}
      sx={(theme) => ({
        position: 'absolute',
        top: box.topPx,
        height: box.heightPx,
        left: 2,
        right: 2,
        boxSizing: 'border-box',
        zIndex: 1,
        px: 0.75,
        py: tight ? 0 : '2px',
        borderRadius: 1,
        overflow: 'hidden',
        textDecoration: 'none',
        color: 'text.primary',
        fontSize: '0.75rem',
        lineHeight: `${BLOCK_METRICS.lineHeightPx}px`,
        display: 'flex',
        flexDirection: 'column',
        justifyContent: tight ? 'center' : 'flex-start',
        // A tint over plain paper, so the shaded break never shows through a block's text.
        bgcolor: theme.palette.background.paper,
        backgroundImage: held ? undefined : `linear-gradient(${tintOf(theme)}, ${tintOf(theme)})`,
        border: tight ? '1px solid' : '2px solid',
        borderStyle: held ? 'dashed' : 'solid',
        borderColor: held
          ? theme.palette.warning.dark
          : booking.state === 'requested'
            ? theme.palette.info.dark
            : theme.palette.primary.main,
        borderTopLeftRadius: block.continuesFromBefore ? 0 : undefined,
        borderTopRightRadius: block.continuesFromBefore ? 0 : undefined,
        borderBottomLeftRadius: block.continuesAfter ? 0 : undefined,
        borderBottomRightRadius: block.continuesAfter ? 0 : undefined,
        '&:hover, &:focus-visible': { boxShadow: theme.shadows[3], zIndex: 2 },
        '&:focus-visible': {
          outline: `3px solid ${theme.palette.secondary.main}`,
          outlineOffset: 1,
        },
      })}
    >
      <Box component="span" sx={lineSx(700)}>
        {booking.customer.name}
        {box.lines === 1 ? ` · ${formatLocalTime(segment.startUtc, timeZone)}` : ''}
      </Box>
      {box.lines >= 2 && (
        <Box component="span" sx={lineSx()}>
          {booking.quote.vehicleName}
        </Box>
      )}
      {box.lines >= 3 && (
        <Box component="span" sx={{ ...lineSx(), color: held ? 'warning.dark' : 'text.secondary' }}>
          {booking.quote.reference} · {stateLine}
        </Box>
      )}
      {box.lines >= 4 && segment.work.length > 0 && (
        <Box component="span" sx={{ ...lineSx(), color: 'text.secondary' }}>
          {segment.work.join(' · ')}
        </Box>
      )}
      {box.lines >= (segment.work.length > 0 ? 5 : 4) && (
        <Box component="span" sx={{ ...lineSx(), color: 'text.secondary' }}>
          {formatLocalRange(segment.startUtc, segment.endUtc, timeZone)}
        </Box>
      )}
    </Box>
  );
}

/**
 * One day of the workshop: bays as columns (their kind under the name), working time down in
 * lines every 30 minutes with the break and closed time shaded to the minute, each stay of a
 * booking a block in its bay placed by its start and end on that same scale (see
 * `layoutBlocks`). Holds are drawn with a dashed outline; a closed day says why.
 */
export function DayBoard({ setup, bookings, date, hrefFor }: Props) {
  const headingId = useId();
  const { timeZone } = setup;
  const status = dayStatus(date, setup);
  const hoursWindow = boardWindow(setup.openingHours);
  const placed: PlacedBlock[] = hoursWindow
    ? placeSegments(bookings, date, timeZone, hoursWindow)
    : [];
  const bays = boardBays(setup.bays, placed);
  const blocks = hoursWindow ? layoutBlocks(placed, hoursWindow) : [];
  const lines = hoursWindow ? rowLines(hoursWindow) : [];
  const bands = hoursWindow ? dayBands(hoursWindow, status.hours) : [];
  const heightPx = hoursWindow ? boardHeightPx(hoursWindow) : 0;

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Typography id={headingId} variant="h2" sx={{ fontSize: '1.25rem', mb: 1.5 }}>
        {formatLocalDate(date, true)}
      </Typography>
      {!status.open && (
        <Alert severity="info" role="note" sx={{ mb: 2 }}>
          <strong>{status.reason}</strong>
          {placed.length > 0 ? ' Some work still sits in a bay on this day.' : ''}
        </Alert>
      )}
      {!hoursWindow || bays.length === 0 ? (
        <Alert severity="warning">
          {bays.length === 0
            ? 'The workshop has no active bay. A manager adds bays under Manage → Workshop.'
            : 'The workshop has no opening hours set.'}
        </Alert>
      ) : status.open || placed.length > 0 ? (
        <Box sx={{ overflowX: 'auto' }}>
          <Box
            sx={{
              display: 'grid',
              gridTemplateColumns: `${GUTTER_PX}px repeat(${bays.length}, minmax(150px, 1fr))`,
              gridTemplateRows: `auto ${heightPx}px`,
              minWidth: GUTTER_PX + bays.length * 150,
              border: 1,
              borderColor: 'divider',
              borderRadius: 1,
              bgcolor: 'background.paper',
            }}
          >
            <Box
              sx={{
                ...stickyGutterSx,
                gridColumn: 1,
                gridRow: 1,
                borderBottom: 1,
                borderColor: 'divider',
              }}
            />
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

            {/* The time column: each hour (and the first row) at its line, the break named. */}
            <Box sx={{ ...stickyGutterSx, gridColumn: 1, gridRow: 2 }}>
              {lines.map((line, index) =>
                line.onTheHour || index === 0 ? (
                  <Box
                    key={line.minute}
                    sx={{
                      position: 'absolute',
                      top: line.topPx,
                      left: 0,
                      right: 0,
                      px: 1,
                      pt: '2px',
                      fontSize: '0.75rem',
                      lineHeight: 1.25,
                      color: 'text.secondary',
                      borderTop: line.onTheHour ? 1 : 0,
                      borderColor: 'divider',
                    }}
                  >
                    {clockText(line.minute)}
                  </Box>
                ) : null,
              )}
              {bands
                .filter((band) => band.kind === 'break')
                .map((band) => (
                  <Box
                    key={`break-${band.fromMinute}`}
                    sx={{
                      position: 'absolute',
                      top: band.topPx + band.heightPx / 2,
                      transform: 'translateY(-50%)',
                      right: 6,
                      fontSize: '0.7rem',
                      fontWeight: 500,
                      color: 'text.secondary',
                      bgcolor: 'background.paper',
                      px: 0.25,
                    }}
                  >
                    Break
                  </Box>
                ))}
            </Box>

            {/* Lines and shading across every bay, under the blocks. */}
            <Box
              aria-hidden
              sx={{
                gridColumn: `2 / span ${bays.length}`,
                gridRow: 2,
                position: 'relative',
                overflow: 'hidden',
              }}
            >
              {bands.map((band) => (
                <Box
                  key={`${band.kind}-${band.fromMinute}`}
                  sx={(theme) => ({
                    position: 'absolute',
                    top: band.topPx,
                    height: band.heightPx,
                    left: 0,
                    right: 0,
                    bgcolor: alpha(theme.palette.text.primary, band.kind === 'break' ? 0.08 : 0.04),
                    backgroundImage:
                      band.kind === 'break'
                        ? `repeating-linear-gradient(45deg, transparent 0 6px, ${alpha(theme.palette.text.primary, 0.06)} 6px 12px)`
                        : undefined,
                  })}
                />
              ))}
              {lines.map((line) => (
                <Box
                  key={line.minute}
                  sx={(theme) => ({
                    position: 'absolute',
                    top: line.topPx,
                    left: 0,
                    right: 0,
                    // The hours solid, the half-hours a fainter dashed line.
                    borderTop: line.onTheHour ? '1px solid' : '1px dashed',
                    borderColor: line.onTheHour
                      ? theme.palette.divider
                      : alpha(theme.palette.text.primary, 0.1),
                  })}
                />
              ))}
            </Box>

            {/* One column per bay: its stays, each placed by its minutes. */}
            {bays.map((bay, index) => (
              <Box
                key={bay.id}
                sx={{
                  gridColumn: index + 2,
                  gridRow: 2,
                  position: 'relative',
                  borderLeft: 1,
                  borderColor: 'divider',
                  minWidth: 0,
                }}
              >
                {blocks
                  .filter((block) => block.segment.bayId === bay.id)
                  .map((block) => (
                    <BoardBlock
                      key={`${block.booking.id}-${block.segment.bayId}-${block.segment.startUtc}`}
                      block={block}
                      timeZone={timeZone}
                      href={hrefFor(block.booking)}
                    />
                  ))}
              </Box>
            ))}
          </Box>
        </Box>
      ) : null}
      {hoursWindow && status.open && placed.length === 0 && (
        <Typography color="text.secondary" sx={{ mt: 1.5 }}>
          No bookings on this day yet.
        </Typography>
      )}
      {(status.open || placed.length > 0) && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
          Times are the workshop&apos;s local time ({timeZone.replace(/_/g, ' ')}). Dashed outline:
          a time held while the customer pays the deposit.
        </Typography>
      )}
    </Box>
  );
}
