import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useCallback, useId, useState } from 'react';
import { PageHeader } from '@/components/ui/page-header';
import type { VehicleModel } from '@/types/api';
import { vehicleName } from '../forms/vehicle-model-fields';
import { VehicleModelDialog } from './vehicle-model-dialog';
import { VehicleModelsGrid } from './vehicle-models-grid';

/** Manage → Vehicles: the spec sheets the fit report checks packages against. */
export function VehiclesScreen() {
  const gridHeadingId = useId();
  const [editing, setEditing] = useState<VehicleModel | null>(null);
  const [editorOpen, setEditorOpen] = useState(false);
  const [saved, setSaved] = useState<string | null>(null);

  const openEditor = useCallback((vehicle: VehicleModel | null) => {
    setEditing(vehicle);
    setEditorOpen(true);
  }, []);

  return (
    <>
      <PageHeader
        title="Vehicles"
        lead="Spec sheets of the vehicle models the shop fits: what every fit report checks against."
        actions={
          <Button
            variant="contained"
            startIcon={<Add aria-hidden />}
            onClick={() => openEditor(null)}
          >
            New vehicle
          </Button>
        }
      />
      {saved && (
        <Alert severity="success" role="status" onClose={() => setSaved(null)} sx={{ mb: 2 }}>
          {saved}
        </Alert>
      )}
      <Box component="section" aria-labelledby={gridHeadingId}>
        <Typography id={gridHeadingId} variant="h2" sx={{ mb: 1.5 }}>
          Vehicle models
        </Typography>
        <VehicleModelsGrid labelledBy={gridHeadingId} onEdit={openEditor} />
      </Box>
      <VehicleModelDialog
        open={editorOpen}
        vehicle={editing}
        onClose={() => setEditorOpen(false)}
        onExited={() => setEditing(null)}
        onSaved={(vehicle, created) => {
          setEditorOpen(false);
          setSaved(`${created ? 'Added' : 'Saved'} ${vehicleName(vehicle)}.`);
        }}
      />
    </>
  );
}
