import Add from '@mui/icons-material/Add';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { useCallback, useId, useState } from 'react';
import { PageHeader } from '@/components/ui/page-header';
import type { ImportSummary, Product } from '@/types/api';
import { useExportCatalogue } from '../api/export-catalogue';
import type { VehicleOption } from '../forms/product-form';
import { CatalogueGrid } from './catalogue-grid';
import { ImportPriceListDialog } from './import-price-list-dialog';
import { ProductDialog } from './product-dialog';

interface Props {
  /** Vehicle models a product can be marked as made for. */
  vehicleOptions: readonly VehicleOption[];
}

type Notice = { severity: 'success' | 'error'; text: string } | null;

function appliedText(summary: ImportSummary): string {
  const parts = [
    `${summary.new} new product${summary.new === 1 ? '' : 's'} added`,
    `${summary.updated} updated`,
  ];
  const skipped =
    summary.rejected > 0
      ? ` ${summary.rejected} rejected row${summary.rejected === 1 ? ' was' : 's were'} skipped.`
      : '';
  return `Price list applied: ${parts.join(', ')}.${skipped}`;
}

/** Manage → Catalogue: the product grid, its editor, and the CSV price list in and out. */
export function CatalogueScreen({ vehicleOptions }: Props) {
  const gridHeadingId = useId();
  const [editing, setEditing] = useState<Product | null>(null);
  const [editorOpen, setEditorOpen] = useState(false);
  const [importOpen, setImportOpen] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);
  const exportCatalogue = useExportCatalogue();

  const openEditor = useCallback((product: Product | null) => {
    setEditing(product);
    setEditorOpen(true);
  }, []);

  return (
    <>
      <PageHeader
        title="Catalogue"
        lead="Products and prices (AUD, tax included). Edit one at a time, or bring a price list in as CSV."
        actions={
          <>
            <Button
              variant="outlined"
              startIcon={<UploadFileOutlined aria-hidden />}
              onClick={() => setImportOpen(true)}
            >
              Import price list
            </Button>
            <Button
              variant="outlined"
              startIcon={
                exportCatalogue.isPending ? (
                  <CircularProgress size={18} color="inherit" aria-hidden />
                ) : (
                  <FileDownloadOutlined aria-hidden />
                )
              }
              aria-busy={exportCatalogue.isPending || undefined}
              disabled={exportCatalogue.isPending}
              onClick={() =>
                exportCatalogue.mutate(undefined, {
                  onError: (error) =>
                    setNotice({
                      severity: 'error',
                      text: `The catalogue could not be exported. ${error.message}`,
                    }),
                })
              }
            >
              Export CSV
            </Button>
            <Button
              variant="contained"
              startIcon={<Add aria-hidden />}
              onClick={() => openEditor(null)}
            >
              New product
            </Button>
          </>
        }
      />

      {notice && (
        <Alert
          severity={notice.severity}
          role={notice.severity === 'success' ? 'status' : 'alert'}
          onClose={() => setNotice(null)}
          sx={{ mb: 2 }}
        >
          {notice.text}
        </Alert>
      )}

      <Box component="section" aria-labelledby={gridHeadingId}>
        <Typography id={gridHeadingId} variant="h2" sx={{ mb: 1.5 }}>
          Products
        </Typography>
        <CatalogueGrid labelledBy={gridHeadingId} onEdit={openEditor} />
      </Box>

      <ProductDialog
        open={editorOpen}
        product={editing}
        vehicleOptions={vehicleOptions}
        onClose={() => setEditorOpen(false)}
        onExited={() => setEditing(null)}
        onSaved={(product, created) => {
          setEditorOpen(false);
          setNotice({
            severity: 'success',
            text: created ? `Added ${product.sku}.` : `Saved ${product.sku}.`,
          });
        }}
      />
      <ImportPriceListDialog
        open={importOpen}
        onClose={() => setImportOpen(false)}
        onApplied={(summary) => {
          setImportOpen(false);
          setNotice({ severity: 'success', text: appliedText(summary) });
        }}
      />
    </>
  );
}
