import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import RadioGroup from '@mui/material/RadioGroup';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { VerdictChip } from '@/components/quote/verdict-chip';
import { formatCents } from '@/lib/money';
import { plannerOptionsQueryOptions } from '../api/get-planner-options';
import { itemOfKind, packageItems } from '../forms/build';
import { kitSpecText } from '../forms/product-text';
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

/** Step 3: a suspension kit that suits the vehicle and its load, or the standard suspension. */
export function LiftStep() {
  const { build, chooseSingle } = usePlanner();
  const [attempted, setAttempted] = useState(false);
  const groupLabelId = useId();
  const kit = itemOfKind(build, 'suspension-kit');
  const options = useQuery({
    ...plannerOptionsQueryOptions({
      vehicleModelId: build.vehicleModelId ?? '',
      constantLoadKg: build.constantLoadKg,
      // The API puts each kit in place of the chosen one, so the current kit is left out.
      items: packageItems(build.items.filter((item) => item.kind !== 'suspension-kit')),
      kind: 'suspension-kit',
    }),
    enabled: build.vehicleModelId !== null,
  });
  const all = options.data?.items ?? [];
  const suitable = all.filter(isSelectable);
  const unsuitable = all.filter((option) => !isSelectable(option));
  const chosenUnsuitable = kit
    ? unsuitable.find((option) => option.product.id === kit.productId)
    : undefined;
  const chosenMissing =
    kit && options.isSuccess && !all.some((option) => option.product.id === kit.productId);
  const blocked = Boolean(chosenUnsuitable || chosenMissing);

  return (
    <PlannerStep
      step="lift"
      lead="Kits are checked against your vehicle and the load you carry. Only those that fit can be chosen."
      onNext={() => {
        setAttempted(true);
        return !blocked && !(options.isPending && kit);
      }}
      footerMessage={
        attempted && blocked
          ? 'The kit you chose does not suit this vehicle or load. Choose another, or keep the standard suspension.'
          : undefined
      }
    >
      {chosenUnsuitable && (
        <Alert severity="warning">
          {chosenUnsuitable.product.name} no longer suits your build:{' '}
          {summaryWithoutVerdict(chosenUnsuitable)}
        </Alert>
      )}
      <Box>
        <Typography id={groupLabelId} variant="h2" sx={{ mb: 1.5 }}>
          Which suspension?
        </Typography>
        {options.isPending ? (
          <OptionsLoading label="Checking the kits for your vehicle" />
        ) : options.isError ? (
          <OptionsError error={options.error} onRetry={() => void options.refetch()} />
        ) : (
          <RadioGroup
            aria-labelledby={groupLabelId}
            value={kit?.productId ?? STANDARD}
            sx={{ display: 'grid', gap: 1, gridTemplateColumns: 'minmax(0, 1fr)' }}
          >
            <ChoiceCard
              type="radio"
              name="suspension"
              value={STANDARD}
              checked={!kit}
              onChange={() => chooseSingle('suspension-kit', null)}
              title="Keep the standard suspension"
              details="No lift. You can still choose wheels and tyres."
            />
            {suitable.map((option) => (
              <ChoiceCard
                key={option.product.id}
                type="radio"
                name="suspension"
                value={option.product.id}
                checked={kit?.productId === option.product.id}
                onChange={() => chooseSingle('suspension-kit', option)}
                title={option.product.name}
                badges={<VerdictChip verdict={option.verdict} />}
                details={
                  <>
                    {option.product.brand} · {kitSpecText(option.product)}
                    <StockNote product={option.product} />
                    {option.verdict !== 'ok' && (
                      <Box component="span" sx={{ display: 'block', mt: 0.5 }}>
                        {summaryWithoutVerdict(option)}
                      </Box>
                    )}
                  </>
                }
                aside={formatCents(option.product.priceCents)}
              />
            ))}
          </RadioGroup>
        )}
        {options.isSuccess && suitable.length === 0 && (
          <Typography color="text.secondary" sx={{ mt: 1.5 }}>
            No kit in the catalogue suits this vehicle and load. The workshop can advise on other
            options.
          </Typography>
        )}
      </Box>
      <UnsuitableOptions options={unsuitable} />
    </PlannerStep>
  );
}
