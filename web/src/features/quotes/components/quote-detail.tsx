import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useQuery } from '@tanstack/react-query';
import { useId, useState, type ReactNode } from 'react';
import { PhotoThumbnails } from '@/components/quote/photo-thumbnails';
import { formatWholeNumber } from '@/lib/format';
import type { Quote, QuoteVersion, VehicleUse } from '@/types/api';
import { workshopQueryOptions } from '../api/get-workshop';
import type { QuoteResponseAction } from '../api/respond-to-quote';
import { QuoteVersionPanel } from './quote-version-panel';
import { RespondDialog } from './respond-dialog';

const useWords: Record<VehicleUse, string> = {
  daily: 'daily driving',
  touring: 'touring',
  towing: 'towing',
  'off-road': 'off-road',
};

interface Props {
  quote: Quote;
  /** The customer answers the latest open version; staff see the quote as it stands. */
  viewer: 'customer' | 'staff';
  /** Extra buttons for a version (the desk's "Send to the customer"). */
  versionActions?: (version: QuoteVersion, latest: boolean) => ReactNode;
}

/**
 * A quote with its versions: side by side on wide screens, one tab per version on phones.
 * Photos, the vehicle and how it is used are shown once above them.
 */
export function QuoteDetail({ quote, viewer, versionActions }: Props) {
  const theme = useTheme();
  const wide = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const workshop = useQuery(workshopQueryOptions());
  const timeZone = workshop.data?.timeZone;
  const versions = [...quote.versions].sort((a, b) => b.number - a.number);
  const latest = versions[0];
  const [tab, setTab] = useState(0);
  const [responding, setResponding] = useState<QuoteResponseAction | null>(null);
  const tabsId = useId();
  const photosHeadingId = useId();
  const versionsHeadingId = useId();

  const actionsFor = (version: QuoteVersion): ReactNode => {
    const isLatest = version.number === latest?.number;
    const extra = versionActions?.(version, isLatest);
    const canAnswer = viewer === 'customer' && isLatest && version.state === 'sent';
    if (!canAnswer) return extra ?? null;
    return (
      <>
        <Button variant="contained" onClick={() => setResponding('accept')}>
          Accept quote
        </Button>
        <Button variant="outlined" color="error" onClick={() => setResponding('decline')}>
          Decline quote
        </Button>
        {extra}
      </>
    );
  };

  const vehicle = quote.vehicle;
  const vehicleLine = [
    vehicle.name,
    vehicle.year ? String(vehicle.year) : null,
    vehicle.customerVehicle?.rego ? `rego ${vehicle.customerVehicle.rego}` : null,
  ]
    .filter(Boolean)
    .join(', ');

  return (
    <Box sx={{ display: 'grid', gap: 3 }}>
      <Card>
        <CardContent sx={{ display: 'grid', gap: 0.5 }}>
          {viewer === 'staff' && (
            <Typography>
              For <strong>{quote.customer.name}</strong>{' '}
              <Link href={`mailto:${quote.customer.email}`}>{quote.customer.email}</Link>
            </Typography>
          )}
          <Typography sx={{ fontWeight: 500 }}>{vehicleLine}</Typography>
          <Typography color="text.secondary">
            Used for {quote.uses.map((use) => useWords[use]).join(', ') || 'no use given'};{' '}
            {formatWholeNumber(quote.constantLoadKg)} kg constant load
          </Typography>
        </CardContent>
      </Card>

      {quote.photos.length > 0 && (
        <Box component="section" aria-labelledby={photosHeadingId}>
          <Typography id={photosHeadingId} variant="h2" sx={{ mb: 1.5 }}>
            Photos
          </Typography>
          <PhotoThumbnails photos={quote.photos} sizePx={128} />
        </Box>
      )}

      <Box component="section" aria-labelledby={versionsHeadingId}>
        <Typography id={versionsHeadingId} variant="h2" sx={{ mb: 1.5 }}>
          {versions.length > 1 ? `${versions.length} versions` : 'The quote'}
        </Typography>
        {wide || versions.length === 1 ? (
          <Box
            sx={{
              display: 'grid',
              gap: 2,
              gridTemplateColumns:
                versions.length === 1
                  ? 'minmax(0, 1fr)'
                  : `repeat(${Math.min(versions.length, 3)}, minmax(0, 1fr))`,
              overflowX: versions.length > 3 ? 'auto' : undefined,
              alignItems: 'start',
            }}
          >
            {versions.map((version) => (
              <QuoteVersionPanel
                key={version.id}
                version={version}
                latest={version.number === latest?.number}
                timeZone={timeZone}
                actions={actionsFor(version)}
                headingId={`${tabsId}-heading-${version.number}`}
              />
            ))}
          </Box>
        ) : (
          <>
            <Tabs
              value={tab}
              onChange={(_event, value: number) => setTab(value)}
              variant="scrollable"
              allowScrollButtonsMobile
              aria-label="Versions of this quote"
              sx={{ mb: 1.5 }}
            >
              {versions.map((version, index) => (
                <Tab
                  key={version.id}
                  id={`${tabsId}-tab-${index}`}
                  aria-controls={`${tabsId}-panel-${index}`}
                  label={`Version ${version.number}${index === 0 ? ' (latest)' : ''}`}
                />
              ))}
            </Tabs>
            {versions.map((version, index) => (
              <Box
                key={version.id}
                role="tabpanel"
                id={`${tabsId}-panel-${index}`}
                aria-labelledby={`${tabsId}-tab-${index}`}
                hidden={tab !== index}
              >
                {tab === index && (
                  <QuoteVersionPanel
                    version={version}
                    latest={index === 0}
                    timeZone={timeZone}
                    actions={actionsFor(version)}
                    hideHeading
                  />
                )}
              </Box>
            ))}
          </>
        )}
      </Box>

      {latest && (
        <RespondDialog
          quote={quote}
          version={latest}
          action={responding}
          onClose={() => setResponding(null)}
        />
      )}
    </Box>
  );
}
