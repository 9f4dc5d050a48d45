import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import RadioGroup from '@mui/material/RadioGroup';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { formatWholeNumber } from '@/lib/format';
import type { CustomerVehicle, VehicleModel } from '@/types/api';
import { modelsOfMakeQueryOptions } from '../api/get-models-of-make';
import { myVehiclesQueryOptions } from '../api/get-my-vehicles';
import { vehicleMakesQueryOptions } from '../api/get-vehicle-makes';
import { usePlanner } from '../hooks/use-planner';
import { ChoiceCard } from './choice-card';
import { PlannerStep } from './planner-step';

const OTHER_VEHICLE = 'other';

function modelName(model: Pick<VehicleModel, 'make' | 'model' | 'variant'>): string {
  return `${model.make} ${model.model} ${model.variant}`;
}

function yearsOf(model: VehicleModel): number[] {
  const years: number[] = [];
  for (let year = model.yearTo; year >= model.yearFrom; year -= 1) years.push(year);
  return years;
}

const suspensionWords = {
  independent: 'independent',
  'solid-axle': 'solid axle',
  leaf: 'leaf springs',
  coil: 'coil springs',
} as const;

/** The stock set-up the planner starts from: tyre size, wheel, mass limit. */
function StockSpec({ model }: { model: VehicleModel }) {
  const headingId = useId();
  return (
    <Card component="section" aria-labelledby={headingId} sx={{ bgcolor: 'background.paper' }}>
      <CardContent>
        <Typography id={headingId} variant="h2" sx={{ fontSize: '1.1rem', mb: 1 }}>
          As it left the factory
        </Typography>
        <Box
          component="dl"
          sx={{
            m: 0,
            display: 'grid',
            gridTemplateColumns: 'auto minmax(0, 1fr)',
            columnGap: 2,
            rowGap: 0.5,
            '& dt': { color: 'text.secondary' },
            '& dd': { m: 0, fontWeight: 500 },
          }}
        >
          <dt>Stock tyre</dt>
          <dd>{model.stockTyre}</dd>
          <dt>Stock wheel</dt>
          <dd>
            {model.stockWheel.diameterIn} × {model.stockWheel.widthIn} in, offset{' '}
            {model.stockWheel.offsetMm} mm
          </dd>
          <dt>GVM</dt>
          <dd>{formatWholeNumber(model.gvmKg)} kg</dd>
          <dt>Suspension</dt>
          <dd>
            Front {suspensionWords[model.frontSuspension]}, rear{' '}
            {suspensionWords[model.rearSuspension]}
          </dd>
        </Box>
      </CardContent>
    </Card>
  );
}

function ownVehicleTitle(vehicle: CustomerVehicle): string {
  return vehicle.nickname ?? modelName(vehicle.vehicleModel);
}

function ownVehicleDetails(vehicle: CustomerVehicle): string {
  return [
    vehicle.nickname ? modelName(vehicle.vehicleModel) : null,
    vehicle.year ? String(vehicle.year) : null,
    vehicle.rego ? `Rego ${vehicle.rego}` : null,
  ]
    .filter(Boolean)
    .join(' · ');
}

/**
 * Step 1 of a revision: the vehicle is the quote's own (a revision prices the same vehicle; another
 * model is a new quote), so it is shown, not chosen.
 */
function RevisedVehicleStep() {
  const { build } = usePlanner();
  return (
    <PlannerStep
      step="vehicle"
      lead="A revision is for the same vehicle. For another model, make a new walk-in quote."
    >
      <Card sx={{ bgcolor: 'background.paper' }}>
        <CardContent>
          <Typography sx={{ fontWeight: 500 }}>
            {build.vehicleName}
            {build.year ? `, ${build.year}` : ''}
          </Typography>
          {build.customer && (
            <Typography color="text.secondary">
              {build.customer.name}'s vehicle, as on quote {build.revision?.reference}
            </Typography>
          )}
        </CardContent>
      </Card>
    </PlannerStep>
  );
}

/** Step 1: the vehicle (shown as it is in a revision, chosen otherwise). */
export function VehicleStep() {
  const { config } = usePlanner();
  return config.mode === 'revise' ? <RevisedVehicleStep /> : <ChooseVehicleStep />;
}

/** Step 1: one of the customer's own vehicles, or make → model → year. */
function ChooseVehicleStep() {
  const { build, config, setVehicle } = usePlanner();
  const ownVehiclesAllowed = config.mode === 'customer' && config.viewerRole === 'customer';
  const myVehicles = useQuery({ ...myVehiclesQueryOptions(), enabled: ownVehiclesAllowed });
  const ownVehicles = ownVehiclesAllowed ? (myVehicles.data?.items ?? []) : [];
  const [choosingOther, setChoosingOther] = useState(build.customerVehicleId === null);
  const [make, setMake] = useState(build.make ?? '');
  const [attempted, setAttempted] = useState(false);
  const groupLabelId = useId();

  const makes = useQuery(vehicleMakesQueryOptions());
  const models = useQuery({ ...modelsOfMakeQueryOptions(make), enabled: make !== '' });
  const modelList = make ? (models.data?.items ?? []) : [];
  const ownVehicle = ownVehicles.find((vehicle) => vehicle.id === build.customerVehicleId);
  const usingOwn = ownVehicles.length > 0 && !choosingOther && ownVehicle !== undefined;
  const selectedModel = usingOwn
    ? ownVehicle.vehicleModel
    : modelList.find((model) => model.id === build.vehicleModelId);
  const years = selectedModel && !usingOwn ? yearsOf(selectedModel) : [];
  const yearValue = build.year !== null && years.includes(build.year) ? String(build.year) : '';

  const chooseOwn = (vehicle: CustomerVehicle) => {
    setChoosingOther(false);
    setVehicle({
      vehicleModelId: vehicle.vehicleModelId,
      vehicleName: modelName(vehicle.vehicleModel),
      make: vehicle.vehicleModel.make,
      year: vehicle.year,
      customerVehicleId: vehicle.id,
    });
  };

  const chooseOther = () => {
    setChoosingOther(true);
    setMake(build.make ?? '');
    if (build.vehicleModelId && build.vehicleName && build.make && build.customerVehicleId) {
      setVehicle({
        vehicleModelId: build.vehicleModelId,
        vehicleName: build.vehicleName,
        make: build.make,
        year: build.year,
        customerVehicleId: null,
      });
    }
  };

  const chooseModel = (model: VehicleModel) => {
    const modelYears = yearsOf(model);
    const keepYear = build.year !== null && modelYears.includes(build.year);
    setVehicle({
      vehicleModelId: model.id,
      vehicleName: modelName(model),
      make: model.make,
      year: keepYear ? build.year : modelYears.length === 1 ? modelYears[0] : null,
      customerVehicleId: null,
    });
  };

  const makeError = attempted && !usingOwn && make === '' ? 'Choose the make.' : undefined;
  const modelError =
    attempted && !usingOwn && make !== '' && !selectedModel ? 'Choose the model.' : undefined;
  const yearError =
    attempted && !usingOwn && selectedModel && yearValue === '' ? 'Choose the year.' : undefined;

  const onNext = () => {
    setAttempted(true);
    if (usingOwn) return true;
    return Boolean(selectedModel && yearValue !== '');
  };

  const selectProps = {
    select: true,
    slotProps: { select: { native: true }, inputLabel: { shrink: true } },
  } as const;

  return (
    <PlannerStep
      step="vehicle"
      lead="Tell us what you drive. Every part the planner offers is made for that model."
      onNext={onNext}
      footerMessage={
        makeError || modelError || yearError
          ? 'Choose the vehicle first: make, model and year.'
          : undefined
      }
    >
      {ownVehiclesAllowed && myVehicles.isPending && (
        <CircularProgress size={24} aria-label="Loading your vehicles" />
      )}
      {ownVehicles.length > 0 && (
        <Box>
          <Typography id={groupLabelId} variant="h2" sx={{ mb: 1.5 }}>
            Which vehicle?
          </Typography>
          <RadioGroup
            aria-labelledby={groupLabelId}
            value={usingOwn ? ownVehicle.id : OTHER_VEHICLE}
            sx={{ display: 'grid', gap: 1, gridTemplateColumns: 'minmax(0, 1fr)' }}
          >
            {ownVehicles.map((vehicle) => (
              <ChoiceCard
                key={vehicle.id}
                type="radio"
                name="own-vehicle"
                value={vehicle.id}
                checked={usingOwn && ownVehicle.id === vehicle.id}
                onChange={() => chooseOwn(vehicle)}
                title={ownVehicleTitle(vehicle)}
                details={ownVehicleDetails(vehicle) || undefined}
              />
            ))}
            <ChoiceCard
              type="radio"
              name="own-vehicle"
              value={OTHER_VEHICLE}
              checked={!usingOwn}
              onChange={chooseOther}
              title="Another vehicle"
              details="Choose the make, model and year."
            />
          </RadioGroup>
        </Box>
      )}

      {!usingOwn && (
        <Box component="fieldset" sx={{ border: 0, p: 0, m: 0, minWidth: 0 }}>
          <Typography component="legend" variant="h2" sx={{ mb: 0.5, p: 0 }}>
            {ownVehicles.length > 0 ? 'Another vehicle' : 'Make, model and year'}
          </Typography>
          {makes.isError && (
            <Alert
              severity="error"
              action={
                <Button color="inherit" onClick={() => void makes.refetch()}>
                  Try again
                </Button>
              }
            >
              The list of makes could not be loaded.
            </Alert>
          )}
          <Box
            sx={{
              display: 'grid',
              columnGap: 2,
              gridTemplateColumns: { xs: '1fr', sm: '1fr 2fr 1fr' },
            }}
          >
            <TextField
              {...selectProps}
              id="planner-make"
              label="Make"
              value={make}
              error={Boolean(makeError)}
              helperText={makeError}
              onChange={(event) => setMake(event.target.value)}
            >
              <option value="">{makes.isPending ? 'Loading…' : 'Choose a make'}</option>
              {(makes.data?.items ?? []).map((name) => (
                <option key={name} value={name}>
                  {name}
                </option>
              ))}
            </TextField>
            <TextField
              {...selectProps}
              id="planner-model"
              label="Model"
              value={selectedModel && !usingOwn ? selectedModel.id : ''}
              disabled={make === ''}
              error={Boolean(modelError)}
              helperText={modelError}
              onChange={(event) => {
                const model = modelList.find((candidate) => candidate.id === event.target.value);
                if (model) chooseModel(model);
              }}
            >
              <option value="">
                {make !== '' && models.isPending ? 'Loading…' : 'Choose a model'}
              </option>
              {modelList.map((model) => (
                <option key={model.id} value={model.id}>
                  {model.model} {model.variant} ({model.yearFrom}–{model.yearTo})
                </option>
              ))}
            </TextField>
            <TextField
              {...selectProps}
              id="planner-year"
              label="Year"
              value={yearValue}
              disabled={!selectedModel}
              error={Boolean(yearError)}
              helperText={yearError}
              onChange={(event) => {
                if (!selectedModel) return;
                setVehicle({
                  vehicleModelId: selectedModel.id,
                  vehicleName: modelName(selectedModel),
                  make: selectedModel.make,
                  year: event.target.value ? Number(event.target.value) : null,
                  customerVehicleId: null,
                });
              }}
            >
              <option value="">Choose a year</option>
              {years.map((year) => (
                <option key={year} value={year}>
                  {year}
                </option>
              ))}
            </TextField>
          </Box>
        </Box>
      )}

      {selectedModel && <StockSpec model={selectedModel} />}
    </PlannerStep>
  );
}
