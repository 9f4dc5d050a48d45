import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The name the saved file gets (the API suggests the same in Content-Disposition). */
export const CATALOGUE_EXPORT_FILE_NAME = 'liftwright-catalogue.csv';

/** The whole catalogue as a CSV price list, in the columns the import reads. */
export function exportCatalogue(): Promise<Blob> {
  return api.getBlob('/api/catalogue/export.csv');
}

/** Downloads the export and hands it to the browser to save. */
export function useExportCatalogue() {
  return useMutation({
    mutationFn: exportCatalogue,
    onSuccess: (blob) => {
      const url = URL.createObjectURL(blob);
      const link = document.createElement('a');
      link.href = url;
      link.download = CATALOGUE_EXPORT_FILE_NAME;
      document.body.append(link);
      link.click();
      link.remove();
      // Give the browser a moment to start the download before the address is released.
      window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
    },
  });
}
