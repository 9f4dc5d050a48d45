import Box from '@mui/material/Box';
import Chip, { type ChipProps } from '@mui/material/Chip';
import FormControlLabel from '@mui/material/FormControlLabel';
import Paper from '@mui/material/Paper';
import Switch from '@mui/material/Switch';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { formatCents } from '@/lib/money';
import type {
  ImportFieldChange,
  ImportPreviewResponse,
  ImportRow,
  ImportRowStatus,
  ImportSummary,
} from '@/types/api';
import {
  attributeFields,
  bayKindLabels,
  kindLabels,
  productFieldLabels,
} from '../forms/product-fields';

export const statusLabels: Record<ImportRowStatus, string> = {
  new: 'New',
  updated: 'Updated',
  unchanged: 'Unchanged',
  rejected: 'Rejected',
};

const statusColours: Record<ImportRowStatus, ChipProps['color']> = {
  new: 'info',
  updated: 'success',
  unchanged: 'default',
  rejected: 'error',
};

const summaryOrder: readonly ImportRowStatus[] = ['new', 'updated', 'unchanged', 'rejected'];

/** Attribute keys as the product editor labels them (the first kind that has the key). */
const attributeLabels = new Map<string, string>();
for (const fields of Object.values(attributeFields)) {
  for (const field of fields) {
    if (!attributeLabels.has(field.key)) attributeLabels.set(field.key, field.label);
  }
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function plain(value: unknown): string {
  if (value === null || value === undefined || value === '') return 'none';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string' || typeof value === 'number') return String(value);
  return JSON.stringify(value);
}

function fieldValue(field: string, value: unknown): string {
  if (field === 'priceCents' && typeof value === 'number') return formatCents(value);
  if (field === 'kind' && typeof value === 'string' && value in kindLabels) {
    return kindLabels[value as keyof typeof kindLabels];
  }
  if (field === 'bayKind') {
    return typeof value === 'string' && value in bayKindLabels
      ? bayKindLabels[value as keyof typeof bayKindLabels]
      : 'no bay time';
  }
  return plain(value);
}

/** One line per changed value: "Price: $1,745.00 → $1,799.00"; attributes key by key. */
export function describeChanges(changes: Record<string, ImportFieldChange>): string[] {
  const lines: string[] = [];
  for (const [field, { from, to }] of Object.entries(changes)) {
    if (field === 'attributes' && isRecord(from) && isRecord(to)) {
      const keys = new Set([...Object.keys(from), ...Object.keys(to)]);
      for (const key of keys) {
        if (JSON.stringify(from[key]) === JSON.stringify(to[key])) continue;
        lines.push(`${attributeLabels.get(key) ?? key}: ${plain(from[key])} → ${plain(to[key])}`);
      }
      continue;
    }
    const label = productFieldLabels[field] ?? field;
    lines.push(`${label}: ${fieldValue(field, from)} → ${fieldValue(field, to)}`);
  }
  return lines;
}

function RowDetails({ row }: { row: ImportRow }) {
  if (row.status === 'rejected') {
    return <Typography variant="body2">{row.reason ?? 'Rejected.'}</Typography>;
  }
  if (row.status === 'updated' && row.changes) {
    return (
      <Box component="ul" sx={{ m: 0, pl: 2.25 }}>
        {describeChanges(row.changes).map((line) => (
          <Typography component="li" variant="body2" key={line}>
            {line}
          </Typography>
        ))}
      </Box>
    );
  }
  return (
    <Typography variant="body2" color="text.secondary">
      {row.status === 'new' ? 'A new product.' : 'No change.'}
    </Typography>
  );
}

export function ImportSummaryList({ summary, label }: { summary: ImportSummary; label: string }) {
  return (
    <Box
      component="ul"
      aria-label={label}
      sx={{ listStyle: 'none', p: 0, m: 0, display: 'flex', flexWrap: 'wrap', gap: 1 }}
    >
      {summaryOrder.map((status) => (
        <li key={status}>
          <Chip
            label={`${summary[status]} ${statusLabels[status].toLowerCase()}`}
            color={summary[status] > 0 ? statusColours[status] : 'default'}
            variant={summary[status] > 0 && status !== 'unchanged' ? 'filled' : 'outlined'}
          />
        </li>
      ))}
    </Box>
  );
}

/** What a price list would change: the counts, then each row with its reason or changes. */
export function ImportPreview({ preview }: { preview: ImportPreviewResponse }) {
  const headingId = useId();
  const [showUnchanged, setShowUnchanged] = useState(false);
  const rows = showUnchanged
    ? preview.rows
    : preview.rows.filter((row) => row.status !== 'unchanged');

  return (
    <Box component="section" aria-labelledby={headingId} sx={{ mt: 2 }}>
      <Typography id={headingId} variant="h3" sx={{ mb: 1 }}>
        What the file changes
      </Typography>
      <ImportSummaryList summary={preview.summary} label="Rows by status" />
      {preview.summary.unchanged > 0 && (
        <FormControlLabel
          sx={{ mt: 1 }}
          control={
            <Switch
              checked={showUnchanged}
              onChange={(event) => setShowUnchanged(event.target.checked)}
            />
          }
          label={`Show the ${preview.summary.unchanged} unchanged row${preview.summary.unchanged === 1 ? '' : 's'}`}
        />
      )}
      <TableContainer component={Paper} variant="outlined" sx={{ mt: 1.5 }}>
        <Table size="small" aria-labelledby={headingId}>
          <TableHead>
            <TableRow>
              <TableCell sx={{ width: 56 }}>Line</TableCell>
              <TableCell>SKU</TableCell>
              <TableCell>Status</TableCell>
              <TableCell sx={{ minWidth: 200 }}>Reason or changes</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.length === 0 && (
              <TableRow>
                <TableCell colSpan={4}>
                  <Typography variant="body2" color="text.secondary">
                    Every row matches the catalogue already.
                  </Typography>
                </TableCell>
              </TableRow>
            )}
            {rows.map((row) => (
              <TableRow key={`${row.line}-${row.sku}`} sx={{ verticalAlign: 'top' }}>
                <TableCell>{row.line}</TableCell>
                <TableCell sx={{ overflowWrap: 'anywhere', minWidth: 96 }}>
                  {row.sku || '(none)'}
                </TableCell>
                <TableCell>
                  <Chip
                    size="small"
                    label={statusLabels[row.status]}
                    color={statusColours[row.status]}
                    variant={row.status === 'unchanged' ? 'outlined' : 'filled'}
                  />
                </TableCell>
                <TableCell>
                  <RowDetails row={row} />
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </Box>
  );
}
