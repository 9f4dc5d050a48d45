import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { formatWholeNumber } from '@/lib/format';
import { formatCents } from '@/lib/money';
import { itemOfKind, useLabels, type PlannerBuild } from '../forms/build';

function Row({ label, value }: { label: string; value: string }) {
  return (
    <Box sx={{ display: 'contents' }}>
      <Box component="dt" sx={{ color: 'text.secondary' }}>
        {label}
      </Box>
      <Box component="dd" sx={{ m: 0, mb: 1 }}>
        {value}
      </Box>
    </Box>
  );
}

/** What the build holds so far, beside the steps on wide screens. */
export function BuildSummary({ build }: { build: PlannerBuild }) {
  const headingId = useId();
  const kit = itemOfKind(build, 'suspension-kit');
  const wheel = itemOfKind(build, 'wheel');
  const tyre = itemOfKind(build, 'tyre');
  const extras = build.items.filter((item) => item.kind === 'component' || item.kind === 'service');
  const partsCents = build.items.reduce((sum, item) => sum + item.priceCents * item.quantity, 0);
  return (
    <Card component="section" aria-labelledby={headingId} sx={{ position: 'sticky', top: 88 }}>
      <CardContent>
        <Typography id={headingId} variant="h2" sx={{ fontSize: '1.1rem', mb: 1.5 }}>
          Your build
        </Typography>
        <Box component="dl" sx={{ m: 0, fontSize: '0.9rem' }}>
          {build.customer && <Row label="For" value={build.customer.name} />}
          <Row
            label="Vehicle"
            value={
              build.vehicleName
                ? `${build.vehicleName}${build.year ? `, ${build.year}` : ''}`
                : 'Not chosen yet'
            }
          />
          <Row
            label="Use"
            value={
              build.uses.length > 0
                ? `${build.uses.map((use) => useLabels[use]).join(', ')}; ${formatWholeNumber(build.constantLoadKg)} kg constant load`
                : 'Not chosen yet'
            }
          />
          <Row label="Suspension" value={kit ? kit.name : 'Standard'} />
          <Row label="Wheels" value={wheel ? `${wheel.quantity} × ${wheel.name}` : 'Standard'} />
          <Row label="Tyres" value={tyre ? `${tyre.quantity} × ${tyre.name}` : 'As fitted'} />
          {extras.length > 0 && (
            <Row label="Add-ons" value={extras.map((item) => item.name).join('; ')} />
          )}
        </Box>
        {build.items.length > 0 && (
          <Typography variant="body2" sx={{ mt: 1, pt: 1.5, borderTop: 1, borderColor: 'divider' }}>
            Parts and services so far: <strong>{formatCents(partsCents)}</strong>
            <Box component="span" sx={{ display: 'block', color: 'text.secondary' }}>
              Labour, fitting and the deposit are worked out on the review step.
            </Box>
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}
