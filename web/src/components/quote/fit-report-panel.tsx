import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import ErrorOutline from '@mui/icons-material/ErrorOutline';
import ExpandMore from '@mui/icons-material/ExpandMore';
import InfoOutlined from '@mui/icons-material/InfoOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import type { ReactElement } from 'react';
import { formatOneDecimal, formatSignedPercent } from '@/lib/format';
import type { FitCheck, FitMetrics, FitReport, FitVerdict, SkippedCheck } from '@/types/api';
import {
  DEFER_TO_LOCAL_RULES,
  checkLabels,
  verdictHeadlines,
  verdictLabels,
  verdictSeverity,
  verdictsWorstFirst,
} from './fit-labels';

const verdictIcons: Record<FitVerdict, ReactElement> = {
  ok: <CheckCircleOutline aria-hidden fontSize="small" sx={{ color: 'success.main' }} />,
  advisory: <InfoOutlined aria-hidden fontSize="small" sx={{ color: 'info.main' }} />,
  'needs-certification': (
    <WarningAmberOutlined aria-hidden fontSize="small" sx={{ color: 'warning.main' }} />
  ),
  'does-not-fit': <ErrorOutline aria-hidden fontSize="small" sx={{ color: 'error.main' }} />,
};

function byVerdict(a: FitCheck, b: FitCheck): number {
  return verdictsWorstFirst.indexOf(a.verdict) - verdictsWorstFirst.indexOf(b.verdict);
}

interface MetricRow {
  label: string;
  value: string;
}

function metricRows(metrics: FitMetrics): MetricRow[] {
  const rows: MetricRow[] = [];
  const mm = (value: number) => `${formatOneDecimal(value)} mm`;
  if (metrics.stockDiameterMm !== null && metrics.newDiameterMm !== null) {
    rows.push({
      label: 'Overall tyre diameter',
      value: `${mm(metrics.stockDiameterMm)} → ${mm(metrics.newDiameterMm)}`,
    });
  }
  if (metrics.diameterChangePercent !== null) {
    rows.push({
      label: 'Diameter change',
      value: formatSignedPercent(metrics.diameterChangePercent),
    });
  }
  if (metrics.speedometerAtTrue100Kmh !== null) {
    rows.push({
      label: 'Speedometer at a true 100 km/h',
      value: `${formatOneDecimal(metrics.speedometerAtTrue100Kmh)} km/h`,
    });
  }
  if (metrics.groundClearanceGainMm !== null) {
    rows.push({ label: 'Ground clearance gain', value: mm(metrics.groundClearanceGainMm) });
  }
  rows.push({ label: 'Combined lift', value: mm(metrics.combinedLiftMm) });
  if (metrics.trackChangeMm !== 0) {
    rows.push({ label: 'Wheel track change', value: mm(metrics.trackChangeMm) });
  }
  if (metrics.jointAngleAddedDeg !== null) {
    rows.push({
      label: 'Front drive-shaft angle added',
      value: `${formatOneDecimal(metrics.jointAngleAddedDeg)}°`,
    });
  }
  return rows;
}

/** The numbers behind the report, as a definition list. */
export function FitMetricsList({ metrics }: { metrics: FitMetrics }) {
  return (
    <Box
      component="dl"
      sx={{
        display: 'grid',
        gridTemplateColumns: 'minmax(0, 1fr) auto',
        columnGap: 2,
        rowGap: 0.75,
        m: 0,
        '& dt': { color: 'text.secondary' },
        '& dd': { m: 0, textAlign: 'right', fontWeight: 500, fontVariantNumeric: 'tabular-nums' },
      }}
    >
      {metricRows(metrics).map((row) => (
        <Box key={row.label} sx={{ display: 'contents' }}>
          <dt>{row.label}</dt>
          <dd>{row.value}</dd>
        </Box>
      ))}
    </Box>
  );
}

/** The cautions of the report, always shown with a lift, plus the product's own deference. */
export function CautionsPanel({ report }: { report: FitReport }) {
  // The report may already say it is a guide; the deference is added only when it does not.
  const saysGuide = report.cautions.some((caution) => caution.code === 'guide-only');
  return (
    <Alert
      severity="warning"
      role="note"
      icon={<WarningAmberOutlined />}
      sx={{ '& ul': { pl: 2.5, my: 0.5 } }}
    >
      <AlertTitle>Before you drive</AlertTitle>
      <Box component="ul">
        {report.cautions.map((caution) => (
          <li key={caution.code}>{caution.message}</li>
        ))}
        {!saysGuide && <li>{DEFER_TO_LOCAL_RULES}</li>}
      </Box>
    </Alert>
  );
}

function CheckList({ checks }: { checks: readonly FitCheck[] }) {
  return (
    <Box component="ul" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.25 }}>
      {checks.map((check) => (
        <Box
          component="li"
          key={check.code}
          sx={{ display: 'flex', gap: 1, alignItems: 'flex-start' }}
        >
          <Box sx={{ pt: '2px', flexShrink: 0 }}>{verdictIcons[check.verdict]}</Box>
          <Box sx={{ minWidth: 0 }}>
            <Typography sx={{ fontWeight: 500 }}>
              {checkLabels[check.code]}
              <Box component="span" sx={{ fontWeight: 400, color: 'text.secondary' }}>
                {' '}
                — {verdictLabels[check.verdict]}
              </Box>
            </Typography>
            <Typography variant="body2">{check.message}</Typography>
          </Box>
        </Box>
      ))}
    </Box>
  );
}

/** "Not checked: bolt pattern and centre bore (the stock wheels stay on the vehicle)." */
function skippedText(skipped: readonly SkippedCheck[]): string {
  if (skipped.length === 0) return '';
  const byReason = new Map<string, string[]>();
  for (const check of skipped) {
    const names = byReason.get(check.message) ?? [];
    names.push(checkLabels[check.code].toLowerCase());
    byReason.set(check.message, names);
  }
  const groups = [...byReason].map(([reason, names]) => {
    const list =
      names.length > 1 ? `${names.slice(0, -1).join(', ')} and ${names.at(-1)}` : names[0];
    return `${list} (${reason.replace(/\.$/, '').replace(/^./, (first) => first.toLowerCase())})`;
  });
  return ` Not checked: ${groups.join('; ')}.`;
}

interface Props {
  report: FitReport;
  /** Level of the panel's own sub-headings. */
  headingLevel?: 'h2' | 'h3' | 'h4' | 'h5';
  /** Only the checks that are not plain "fits" (for a quote's summary). */
  onlyFindings?: boolean;
}

/**
 * A fit report as the server made it: verdict, the cautions (prominently, straight after the
 * verdict), every check with its message, and the numbers. The client decides nothing here.
 */
export function FitReportPanel({ report, headingLevel = 'h3', onlyFindings = false }: Props) {
  const checks = [...report.checks].sort(byVerdict);
  const findings = checks.filter((check) => check.verdict !== 'ok');
  const passed = checks.filter((check) => check.verdict === 'ok');
  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'minmax(0, 1fr)' }}>
      <Alert severity={verdictSeverity[report.verdict]} role="status">
        <AlertTitle>{verdictLabels[report.verdict]}</AlertTitle>
        {verdictHeadlines[report.verdict]}
      </Alert>

      <CautionsPanel report={report} />

      <Box>
        <Typography variant="h4" component={headingLevel} sx={{ mb: 1 }}>
          What the checks found
        </Typography>
        {findings.length === 0 ? (
          <Typography color="text.secondary">Every check passed.</Typography>
        ) : (
          <CheckList checks={findings} />
        )}
      </Box>

      {!onlyFindings && passed.length > 0 && (
        <Accordion
          disableGutters
          variant="outlined"
          sx={{ borderRadius: 2, '&::before': { display: 'none' } }}
        >
          <AccordionSummary expandIcon={<ExpandMore aria-hidden />}>
            <Typography sx={{ fontWeight: 500 }}>Checks passed ({passed.length})</Typography>
          </AccordionSummary>
          <AccordionDetails>
            <CheckList checks={passed} />
          </AccordionDetails>
        </Accordion>
      )}

      {!onlyFindings && (
        <Box>
          <Typography variant="h4" component={headingLevel} sx={{ mb: 1 }}>
            The numbers
          </Typography>
          <FitMetricsList metrics={report.metrics} />
        </Box>
      )}

      <Typography variant="body2" color="text.secondary">
        Checked against the rule set “{report.ruleSetName}”.
        {skippedText(report.skippedChecks)}
      </Typography>
    </Box>
  );
}
