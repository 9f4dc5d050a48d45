import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useId, useRef, useState, type ChangeEvent } from 'react';
import { isApiError } from '@/lib/api-client';
import { tokens } from '@/theme/theme';
import type { ImportPreviewResponse, ImportSummary } from '@/types/api';
import { useApplyPriceList } from '../api/apply-price-list';
import { usePreviewPriceList } from '../api/preview-price-list';
import { ImportPreview } from './import-preview';

/** The API's upload limit (1 MB); a larger file is refused here before it is sent. */
export const PRICE_LIST_MAX_BYTES = 1024 * 1024;

/** The columns a price list must name in its first row (the export writes the same). */
export const PRICE_LIST_COLUMNS =
  'sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes';

interface Props {
  open: boolean;
  onClose: () => void;
  /** After a successful apply, with what was written. */
  onApplied: (summary: ImportSummary) => void;
}

function refusalOf(error: unknown): string {
  if (isApiError(error)) {
    if (error.statusCode === 413)
      return 'The file is larger than the 1 MB limit. Split it, then import each part.';
    return error.message;
  }
  return 'Something went wrong. Please try again.';
}

function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}

/**
 * Import a CSV price list in two steps: choosing a file shows what it would change (nothing is
 * written), then "Apply changes" writes every new and updated row at once.
 */
export function ImportPriceListDialog({ open, onClose, onApplied }: Props) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  const inputId = useId();
  const hintId = useId();
  const applyNoteId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<ImportPreviewResponse | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  const previewPriceList = usePreviewPriceList();
  const applyPriceList = useApplyPriceList();
  const busy = previewPriceList.isPending || applyPriceList.isPending;

  function reset() {
    setFile(null);
    setPreview(null);
    setRefusal(null);
    previewPriceList.reset();
    applyPriceList.reset();
    if (inputRef.current) inputRef.current.value = '';
  }

  async function onFileChosen(event: ChangeEvent<HTMLInputElement>) {
    const chosen = event.target.files?.[0] ?? null;
    setPreview(null);
    setRefusal(null);
    setFile(chosen);
    if (!chosen) return;
    if (chosen.size > PRICE_LIST_MAX_BYTES) {
      setRefusal('The file is larger than the 1 MB limit. Split it, then import each part.');
      return;
    }
    try {
      setPreview(await previewPriceList.mutateAsync(chosen));
    } catch (error) {
      setRefusal(refusalOf(error));
    }
  }

  async function onApply() {
    if (!file) return;
    setRefusal(null);
    try {
      const result = await applyPriceList.mutateAsync(file);
      onApplied(result.summary);
    } catch (error) {
      setRefusal(refusalOf(error));
    }
  }

  const changes = preview ? preview.summary.new + preview.summary.updated : 0;

  return (
    <Dialog
      open={open}
      onClose={busy ? undefined : onClose}
      fullWidth
      maxWidth="md"
      fullScreen={phone}
      aria-labelledby={titleId}
      slotProps={{ transition: { onExited: reset } }}
    >
      <DialogTitle id={titleId}>Import price list</DialogTitle>
      <DialogContent sx={{ pt: 0 }}>
        <Typography color="text.secondary" id={hintId}>
          A CSV file of at most 1 MB whose first row names the columns{' '}
          <Box component="code" sx={{ overflowWrap: 'anywhere', fontSize: '0.85em' }}>
            {PRICE_LIST_COLUMNS}
          </Box>
          , with the price in dollars (like 1249.00). Rows are matched by SKU. &ldquo;Export
          CSV&rdquo; gives a file in this form. Nothing changes until you apply.
        </Typography>
        <Box sx={{ mt: 2, display: 'grid', gap: 0.75 }}>
          <Typography component="label" htmlFor={inputId} sx={{ fontWeight: 500 }}>
            Price list file (CSV)
          </Typography>
          <Box
            component="input"
            ref={inputRef}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            aria-describedby={hintId}
            disabled={busy}
            onChange={onFileChosen}
            sx={{
              font: 'inherit',
              maxWidth: '100%',
              '&::file-selector-button': {
                font: 'inherit',
                fontWeight: 500,
                mr: 1.5,
                px: 2,
                minHeight: 40,
                borderRadius: 2,
                border: `1px solid ${tokens.eucalyptus}`,
                color: tokens.eucalyptusDeep,
                bgcolor: 'background.paper',
                cursor: 'pointer',
              },
            }}
          />
        </Box>

        {previewPriceList.isPending && (
          <Box role="status" sx={{ display: 'flex', alignItems: 'center', gap: 1.5, mt: 2 }}>
            <CircularProgress size={20} aria-hidden />
            <Typography>Reading {file?.name ?? 'the file'}…</Typography>
          </Box>
        )}

        {refusal && (
          <Alert severity="error" sx={{ mt: 2 }}>
            <AlertTitle>The price list was not imported</AlertTitle>
            {refusal}
          </Alert>
        )}

        {preview && <ImportPreview preview={preview} />}
      </DialogContent>
      <DialogActions
        sx={{
          px: 3,
          pb: 2.5,
          gap: 1,
          flexWrap: 'wrap',
          justifyContent: 'flex-end',
        }}
      >
        {preview && (
          <Typography id={applyNoteId} variant="body2" sx={{ flex: '1 1 240px', mr: 'auto' }}>
            {changes > 0
              ? `Apply ${plural(changes, 'change')}: ${preview.summary.new} new, ${preview.summary.updated} updated${
                  preview.summary.rejected > 0
                    ? `; ${plural(preview.summary.rejected, 'rejected row')} will be skipped`
                    : ''
                }.`
              : 'Nothing to apply: the file matches the catalogue.'}
          </Typography>
        )}
        <Button onClick={onClose} disabled={busy}>
          Cancel
        </Button>
        <Button
          variant="contained"
          onClick={onApply}
          disabled={!preview || changes === 0 || busy}
          aria-describedby={preview ? applyNoteId : undefined}
          aria-busy={applyPriceList.isPending || undefined}
          startIcon={
            applyPriceList.isPending ? (
              <CircularProgress size={18} color="inherit" aria-hidden />
            ) : undefined
          }
        >
          Apply changes
        </Button>
      </DialogActions>
    </Dialog>
  );
}
