import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import RadioGroup from '@mui/material/RadioGroup';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { VerdictChip } from '@/components/quote/verdict-chip';
import { formatOneDecimal, formatSignedPercent } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { PlannerOption, PlannerOptionMetrics, ProductKind } from '@/types/api';
import { plannerOptionsQueryOptions } from '../api/get-planner-options';
import { itemOfKind, packageItems, type BuildItem } from '../forms/build';
import { metricsText, tyreSpecText, wheelMetricsText, wheelSpecText } from '../forms/product-text';
import { usePlanner } from '../hooks/use-planner';
import { ChoiceCard } from './choice-card';
import {
  OptionsError,
  OptionsLoading,
  StockNote,
  UnsuitableOptions,
  isSelectable,
  summaryWithoutVerdict,
} from './options-state';
import { PlannerStep } from './planner-step';

const STANDARD = 'standard';

function useKindOptions(kind: ProductKind) {
  const { build } = usePlanner();
  return useQuery({
    ...plannerOptionsQueryOptions({
      vehicleModelId: build.vehicleModelId ?? '',
      constantLoadKg: build.constantLoadKg,
      // Each option is put in place of the chosen one of its kind, so that one is left out.
      items: packageItems(build.items.filter((item) => item.kind !== kind)),
      kind,
    }),
    enabled: build.vehicleModelId !== null,
  });
}

interface QuestionProps {
  kind: 'wheel' | 'tyre';
  question: string;
  standardTitle: string;
  standardDetails: string;
  chosen: BuildItem | undefined;
  options: ReturnType<typeof useKindOptions>;
  onChoose: (option: PlannerOption | null) => void;
}

function PartQuestion({
  kind,
  question,
  standardTitle,
  standardDetails,
  chosen,
  options,
  onChoose,
}: QuestionProps) {
  const labelId = useId();
  const all = options.data?.items ?? [];
  const suitable = all.filter(isSelectable);
  const unsuitable = all.filter((option) => !isSelectable(option));
  return (
    <Box component="section" aria-labelledby={labelId} sx={{ display: 'grid', gap: 1.5 }}>
      <Typography id={labelId} variant="h2">
        {question}
      </Typography>
      {options.isPending ? (
        <OptionsLoading
          label={`Checking the ${kind === 'wheel' ? 'wheels' : 'tyres'} for your build`}
        />
      ) : options.isError ? (
        <OptionsError error={options.error} onRetry={() => void options.refetch()} />
      ) : (
        <RadioGroup
          aria-labelledby={labelId}
          value={chosen?.productId ?? STANDARD}
          sx={{ display: 'grid', gap: 1, gridTemplateColumns: 'minmax(0, 1fr)' }}
        >
          <ChoiceCard
            type="radio"
            name={kind}
            value={STANDARD}
            checked={!chosen}
            onChange={() => onChoose(null)}
            title={standardTitle}
            details={standardDetails}
          />
          {suitable.map((option) => (
            <ChoiceCard
              key={option.product.id}
              type="radio"
              name={kind}
              value={option.product.id}
              checked={chosen?.productId === option.product.id}
              onChange={() => onChoose(option)}
              title={option.product.name}
              badges={<VerdictChip verdict={option.verdict} />}
              details={
                <>
                  {option.product.brand} ·{' '}
                  {kind === 'wheel' ? wheelSpecText(option.product) : tyreSpecText(option.product)}
                  <StockNote product={option.product} />
                  <Box component="span" sx={{ display: 'block', mt: 0.5, color: 'text.primary' }}>
                    {kind === 'wheel'
                      ? wheelMetricsText(option.metrics)
                      : metricsText(option.metrics)}
                  </Box>
                  {option.verdict !== 'ok' && (
                    <Box component="span" sx={{ display: 'block', mt: 0.5 }}>
                      {summaryWithoutVerdict(option)}
                    </Box>
                  )}
                </>
              }
              aside={
                <>
                  {formatCents(option.product.priceCents)}
                  <Box
                    component="span"
                    sx={{
                      display: 'block',
                      fontWeight: 400,
                      fontSize: '0.8rem',
                      color: 'text.secondary',
                    }}
                  >
                    each
                  </Box>
                </>
              }
            />
          ))}
        </RadioGroup>
      )}
      <UnsuitableOptions
        options={unsuitable}
        title={kind === 'wheel' ? 'Wheels that do not fit' : 'Tyres that do not fit'}
      />
    </Box>
  );
}

/** The effect of the current choice, updated (and announced) as the customer chooses. */
function ChoiceEffect({ metrics }: { metrics: PlannerOptionMetrics | null }) {
  const headingId = useId();
  const rows: [string, string][] = [];
  if (metrics) {
    if (metrics.newDiameterMm !== null) {
      rows.push(['New overall diameter', `${formatOneDecimal(metrics.newDiameterMm)} mm`]);
    }
    if (metrics.diameterChangePercent !== null) {
      rows.push(['Diameter change', formatSignedPercent(metrics.diameterChangePercent)]);
    }
    if (metrics.speedometerAtTrue100Kmh !== null) {
      rows.push([
        'Speedometer at a true 100 km/h',
        `${formatOneDecimal(metrics.speedometerAtTrue100Kmh)} km/h`,
      ]);
    }
    rows.push(['Combined lift', `${formatOneDecimal(metrics.combinedLiftMm)} mm`]);
  }
  return (
    <Card component="section" aria-labelledby={headingId} sx={{ bgcolor: 'background.paper' }}>
      <CardContent>
        <Typography id={headingId} variant="h2" sx={{ fontSize: '1.1rem', mb: 1 }}>
          With your choice
        </Typography>
        <Box aria-live="polite">
          {rows.length === 0 ? (
            <Typography color="text.secondary">
              Standard wheels and tyres: the overall diameter and the speedometer stay as they are.
            </Typography>
          ) : (
            <Box
              component="dl"
              sx={{
                m: 0,
                display: 'grid',
                gridTemplateColumns: 'minmax(0, 1fr) auto',
                columnGap: 2,
                rowGap: 0.5,
                '& dt': { color: 'text.secondary' },
                '& dd': { m: 0, fontWeight: 500, textAlign: 'right' },
              }}
            >
              {rows.map(([label, value]) => (
                <Box key={label} sx={{ display: 'contents' }}>
                  <dt>{label}</dt>
                  <dd>{value}</dd>
                </Box>
              ))}
            </Box>
          )}
        </Box>
      </CardContent>
    </Card>
  );
}

/** Step 4: wheels, tyres and how many (four, or five with the spare). */
export function WheelsStep() {
  const { build, chooseSingle, setWheelQuantity } = usePlanner();
  const [attempted, setAttempted] = useState(false);
  const quantityLabelId = useId();
  const wheel = itemOfKind(build, 'wheel');
  const tyre = itemOfKind(build, 'tyre');
  const wheelOptions = useKindOptions('wheel');
  const tyreOptions = useKindOptions('tyre');

  const chosenWheelOption = wheelOptions.data?.items.find(
    (option) => option.product.id === wheel?.productId,
  );
  const chosenTyreOption = tyreOptions.data?.items.find(
    (option) => option.product.id === tyre?.productId,
  );
  const unsuitableChoice = [chosenWheelOption, chosenTyreOption].find(
    (option) => option !== undefined && !isSelectable(option),
  );
  // The tyre's figures already include the chosen wheel and kit; without a tyre, the wheel's.
  const metrics = tyre
    ? (chosenTyreOption?.metrics ?? null)
    : wheel
      ? (chosenWheelOption?.metrics ?? null)
      : null;

  return (
    <PlannerStep
      step="wheels"
      lead="Each wheel and tyre is checked with the rest of your build: bolt pattern, load rating, rim width, diameter and speedometer."
      onNext={() => {
        setAttempted(true);
        return unsuitableChoice === undefined;
      }}
      footerMessage={
        attempted && unsuitableChoice
          ? `${unsuitableChoice.product.name} does not fit with the rest of your build. Choose another, or keep the standard part.`
          : undefined
      }
    >
      {unsuitableChoice && (
        <Alert severity="warning">
          {unsuitableChoice.product.name} no longer fits your build:{' '}
          {summaryWithoutVerdict(unsuitableChoice)}
        </Alert>
      )}
      <PartQuestion
        kind="wheel"
        question="Which wheels?"
        standardTitle="Keep the standard wheels"
        standardDetails="The wheels the vehicle has now."
        chosen={wheel}
        options={wheelOptions}
        onChoose={(option) => chooseSingle('wheel', option)}
      />
      <PartQuestion
        kind="tyre"
        question="Which tyres?"
        standardTitle="Keep the tyres on the vehicle"
        standardDetails="No new tyres; the stock size is used for the checks."
        chosen={tyre}
        options={tyreOptions}
        onChoose={(option) => chooseSingle('tyre', option)}
      />
      <ChoiceEffect metrics={metrics} />
      {(wheel || tyre) && (
        <Box component="section" aria-labelledby={quantityLabelId}>
          <Typography id={quantityLabelId} variant="h2" sx={{ mb: 1.5 }}>
            How many wheels and tyres?
          </Typography>
          <RadioGroup
            aria-labelledby={quantityLabelId}
            value={String(build.wheelQuantity)}
            sx={{
              display: 'grid',
              gap: 1,
              gridTemplateColumns: { xs: 'minmax(0, 1fr)', sm: '1fr 1fr' },
            }}
          >
            <ChoiceCard
              type="radio"
              name="wheel-quantity"
              value="4"
              checked={build.wheelQuantity === 4}
              onChange={() => setWheelQuantity(4)}
              title="4, the road wheels"
              details="The spare stays as it is."
            />
            <ChoiceCard
              type="radio"
              name="wheel-quantity"
              value="5"
              checked={build.wheelQuantity === 5}
              onChange={() => setWheelQuantity(5)}
              title="5, with a matching spare"
              details="Worth it when the tyre size changes, so the spare matches the other four."
            />
          </RadioGroup>
        </Box>
      )}
    </PlannerStep>
  );
}
