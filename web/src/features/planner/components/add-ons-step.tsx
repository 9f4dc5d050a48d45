import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { useCallback, useEffect, useId, useMemo } from 'react';
import { additionExplanations, additionLabels } from '@/components/quote/fit-labels';
import { VerdictChip } from '@/components/quote/verdict-chip';
import { formatCents } from '@/lib/money';
import type { PlannerOption, ProductKind, SuggestedAddition } from '@/types/api';
import { plannerOptionsQueryOptions } from '../api/get-planner-options';
import { quotePreviewQueryOptions } from '../api/preview-quote';
import { packageItems, toPackage } from '../forms/build';
import { serviceAttributes } from '../forms/product-text';
import { usePlanner } from '../hooks/use-planner';
import { ChoiceCard } from './choice-card';
import {
  OptionsError,
  OptionsLoading,
  StockNote,
  UnsuitableOptions,
  isSelectable,
} from './options-state';
import { PlannerStep } from './planner-step';

/** Charged by the workshop's policy for every wheel and tyre: never chosen as a line. */
function chargedByPolicy(option: PlannerOption): boolean {
  const role = serviceAttributes(option.product)?.role;
  return role === 'fitting-balancing' || role === 'tyre-disposal';
}

function usePackageOptions(kind: ProductKind, enabled = true) {
  const { build } = usePlanner();
  return useQuery({
    ...plannerOptionsQueryOptions({
      vehicleModelId: build.vehicleModelId ?? '',
      constantLoadKg: build.constantLoadKg,
      items: packageItems(build.items),
      kind,
    }),
    enabled: enabled && build.vehicleModelId !== null,
  });
}

function SuggestionCard({
  suggestion,
  onUseKit,
}: {
  suggestion: SuggestedAddition;
  onUseKit?: () => void;
}) {
  return (
    <Box component="li" sx={{ listStyle: 'none' }}>
      <Typography sx={{ fontWeight: 500 }}>
        {additionLabels[suggestion.role]}
        {suggestion.required && (
          <Chip
            component="span"
            size="small"
            color="warning"
            variant="outlined"
            label="Needed for this package"
            sx={{ ml: 1 }}
          />
        )}
      </Typography>
      <Typography variant="body2">{suggestion.reason}</Typography>
      {additionExplanations[suggestion.role] && (
        <Typography variant="body2" color="text.secondary">
          {additionExplanations[suggestion.role]}
        </Typography>
      )}
      {onUseKit && (
        <Button size="small" variant="outlined" onClick={onUseKit} sx={{ mt: 1 }}>
          Use the kit rated for your load
        </Button>
      )}
    </Box>
  );
}

function AddOnList({
  title,
  options,
  chosenIds,
  onToggle,
  packageVerdict,
}: {
  title: string;
  options: readonly PlannerOption[];
  chosenIds: ReadonlySet<string>;
  onToggle: (option: PlannerOption, checked: boolean) => void;
  /** The verdict of the build as it stands: an add-on shows its own only when it differs. */
  packageVerdict: PlannerOption['verdict'] | undefined;
}) {
  const labelId = useId();
  if (options.length === 0) return null;
  return (
    <Box component="section" aria-labelledby={labelId}>
      <Typography id={labelId} variant="h2" sx={{ mb: 1.5 }}>
        {title}
      </Typography>
      <Box
        role="group"
        aria-labelledby={labelId}
        sx={{ display: 'grid', gap: 1, gridTemplateColumns: 'minmax(0, 1fr)' }}
      >
        {options.map((option) => {
          const ownVerdict = option.verdict !== 'ok' && option.verdict !== packageVerdict;
          return (
            <ChoiceCard
              key={option.product.id}
              type="checkbox"
              name="add-ons"
              value={option.product.id}
              checked={chosenIds.has(option.product.id)}
              onChange={(checked) => onToggle(option, checked)}
              title={option.product.name}
              badges={
                option.suggestedBy.length > 0 || ownVerdict ? (
                  <>
                    {option.suggestedBy.map((role) => (
                      <Chip
                        key={role}
                        size="small"
                        color="primary"
                        label={`Suggested: ${additionLabels[role].toLowerCase()}`}
                        sx={{
                          height: 'auto',
                          maxWidth: '100%',
                          '& .MuiChip-label': { whiteSpace: 'normal', py: 0.25 },
                        }}
                      />
                    ))}
                    {ownVerdict && <VerdictChip verdict={option.verdict} />}
                  </>
                ) : undefined
              }
              details={
                <>
                  {option.product.description || option.product.brand}
                  <StockNote product={option.product} />
                  {ownVerdict && (
                    <Box component="span" sx={{ display: 'block', mt: 0.5 }}>
                      {option.summary}
                    </Box>
                  )}
                </>
              }
              aside={formatCents(option.product.priceCents)}
            />
          );
        })}
      </Box>
    </Box>
  );
}

/** Step 5: what the fit report suggests, explained, and the parts and services to add. */
export function AddOnsStep() {
  const { build, setAddOn, includeRequired, chooseSingle } = usePlanner();
  const components = usePackageOptions('component');
  const services = usePackageOptions('service');
  // The build's own verdict (the review's preview, usually cached): an add-on's verdict is shown
  // only where it differs, so a package that already needs a certificate does not read as if
  // each add-on were the reason.
  const body = toPackage(build);
  const preview = useQuery({
    ...quotePreviewQueryOptions(
      body ?? { vehicleModelId: '', uses: [], constantLoadKg: 0, items: [] },
    ),
    enabled: body !== null,
  });
  const packageVerdict = preview.data?.fitReport.verdict;
  const suggestions = useMemo(
    () => components.data?.suggestedAdditions ?? services.data?.suggestedAdditions ?? [],
    [components.data, services.data],
  );
  const kitSwap = suggestions.find(
    (suggestion) => suggestion.role === 'spring-rating' && suggestion.variantId,
  );
  const kits = usePackageOptions('suspension-kit', kitSwap !== undefined);
  const kitVariant = kits.data?.items.find((option) => option.product.id === kitSwap?.variantId);
  const settled =
    components.isSuccess &&
    services.isSuccess &&
    !components.isFetching &&
    !services.isFetching &&
    !components.isPlaceholderData &&
    !services.isPlaceholderData;

  const chosenIds = useMemo(
    () => new Set(build.items.map((item) => item.productId)),
    [build.items],
  );
  // What can be ticked: what fits, plus anything already chosen (so it can be taken off again).
  const offered = useCallback(
    (option: PlannerOption) => isSelectable(option) || chosenIds.has(option.product.id),
    [chosenIds],
  );
  const componentOptions = useMemo(
    () => (components.data?.items ?? []).filter(offered),
    [components.data, offered],
  );
  const serviceOptions = useMemo(
    () =>
      (services.data?.items ?? []).filter((option) => offered(option) && !chargedByPolicy(option)),
    [services.data, offered],
  );
  const unsuitable = [...(components.data?.items ?? []), ...(services.data?.items ?? [])].filter(
    (option) => !offered(option),
  );
  const fillerFor = useCallback(
    (suggestion: SuggestedAddition) =>
      [...componentOptions, ...serviceOptions].find(
        (option) => isSelectable(option) && option.suggestedBy.includes(suggestion.role),
      ),
    [componentOptions, serviceOptions],
  );

  // A required addition (e.g. the alignment after a lift) goes in by itself, with its reason.
  useEffect(() => {
    if (!settled) return;
    for (const suggestion of suggestions) {
      if (!suggestion.required) continue;
      const filler = fillerFor(suggestion);
      if (filler) includeRequired(filler, suggestion.role, suggestion.reason);
    }
  }, [settled, suggestions, fillerFor, includeRequired]);

  const required = build.items.filter((item) => item.requiredFor !== null);
  const requiredIds = new Set(required.map((item) => item.productId));
  const openSuggestions = suggestions.filter(
    (suggestion) => !(suggestion.required && fillerFor(suggestion)),
  );
  const unfilledRequired = suggestions.filter(
    (suggestion) => suggestion.required && !fillerFor(suggestion),
  );
  const requiredHeadingId = useId();
  const suggestionsHeadingId = useId();

  const loading = components.isPending || services.isPending;
  const failed = components.isError ? components : services.isError ? services : null;

  return (
    <PlannerStep
      step="add-ons"
      lead="The fit check suggests what your build needs alongside the main parts. Add anything else you want fitted while the vehicle is in."
      onNext={() => !loading}
    >
      {loading ? (
        <OptionsLoading label="Checking what your build needs" />
      ) : failed ? (
        <OptionsError error={failed.error} onRetry={() => void failed.refetch()} />
      ) : (
        <>
          {required.length > 0 && (
            <Card component="section" aria-labelledby={requiredHeadingId}>
              <CardContent>
                <Typography id={requiredHeadingId} variant="h2" sx={{ mb: 1 }}>
                  Needed for this package
                </Typography>
                <Box component="ul" sx={{ m: 0, p: 0, display: 'grid', gap: 1.5 }}>
                  {required.map((item) => (
                    <Box
                      component="li"
                      key={item.productId}
                      sx={{
                        listStyle: 'none',
                        display: 'flex',
                        gap: 2,
                        justifyContent: 'space-between',
                      }}
                    >
                      <Box>
                        <Typography sx={{ fontWeight: 500 }}>{item.name}</Typography>
                        {item.reason && <Typography variant="body2">{item.reason}</Typography>}
                        {item.requiredFor && additionExplanations[item.requiredFor] && (
                          <Typography variant="body2" color="text.secondary">
                            {additionExplanations[item.requiredFor]}
                          </Typography>
                        )}
                      </Box>
                      <Typography sx={{ fontWeight: 500, whiteSpace: 'nowrap' }}>
                        {formatCents(item.priceCents * item.quantity)}
                      </Typography>
                    </Box>
                  ))}
                </Box>
              </CardContent>
            </Card>
          )}
          {unfilledRequired.length > 0 && (
            <Alert severity="warning">
              <AlertTitle>Ask the workshop</AlertTitle>
              {unfilledRequired
                .map((suggestion) => additionLabels[suggestion.role])
                .join(', ')}{' '}
              {unfilledRequired.length === 1 ? 'is' : 'are'} needed for this package, but the
              catalogue has nothing for your vehicle to fill it yet. Ask the workshop before you
              book.
            </Alert>
          )}
          {openSuggestions.length > 0 && (
            <Box component="section" aria-labelledby={suggestionsHeadingId}>
              <Typography id={suggestionsHeadingId} variant="h2" sx={{ mb: 1 }}>
                Suggested for your build
              </Typography>
              <Box component="ul" sx={{ m: 0, p: 0, display: 'grid', gap: 2 }}>
                {openSuggestions.map((suggestion) => (
                  <SuggestionCard
                    key={suggestion.role}
                    suggestion={suggestion}
                    onUseKit={
                      suggestion === kitSwap && kitVariant
                        ? () => chooseSingle('suspension-kit', kitVariant)
                        : undefined
                    }
                  />
                ))}
              </Box>
            </Box>
          )}
          {suggestions.length === 0 && required.length === 0 && (
            <Typography color="text.secondary">
              The fit check has nothing to add to your build.
            </Typography>
          )}
          <AddOnList
            title="Parts"
            options={componentOptions.filter((option) => !requiredIds.has(option.product.id))}
            chosenIds={chosenIds}
            onToggle={(option, checked) => setAddOn(option, checked)}
            packageVerdict={packageVerdict}
          />
          <AddOnList
            title="Workshop services"
            options={serviceOptions.filter((option) => !requiredIds.has(option.product.id))}
            chosenIds={chosenIds}
            onToggle={(option, checked) => setAddOn(option, checked)}
            packageVerdict={packageVerdict}
          />
          <UnsuitableOptions options={unsuitable} title="Not suitable for this build" />
          <Typography variant="body2" color="text.secondary">
            Fitting and balancing, and the disposal of old tyres, are charged per wheel and tyre;
            they appear on the review.
          </Typography>
        </>
      )}
    </PlannerStep>
  );
}
