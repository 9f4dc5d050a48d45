import * as yup from 'yup';
import { numberInRange } from '@/lib/number-fields';
import type { Bay, BayKind, CreateBayRequest, UpdateBayRequest } from '@/types/api';

/** Mirrors the API's CreateBayDto and UpdateBayDto. */
export const BAY_NAME_MAX = 60;

export const bayKindOptions: readonly { value: BayKind; label: string }[] = [
  { value: 'hoist', label: 'Hoist bay' },
  { value: 'alignment', label: 'Alignment bay' },
  { value: 'tyre', label: 'Tyre bay' },
];

export const bayKindLabel: Record<BayKind, string> = {
  hoist: 'Hoist bay',
  alignment: 'Alignment bay',
  tyre: 'Tyre bay',
};

export interface BayFormValues {
  name: string;
  kind: BayKind;
  /** Editing only: the place in the order (1 first). */
  position: string;
  active: boolean;
}

export const bayFormFields = ['name', 'kind', 'position', 'active'] as const;

export function baySchema(bayCount: number) {
  return yup.object({
    name: yup
      .string()
      .trim()
      .required('Name the bay, such as Hoist 4.')
      .max(BAY_NAME_MAX, `Use at most ${BAY_NAME_MAX} characters.`),
    kind: yup
      .string()
      .oneOf(bayKindOptions.map((option) => option.value))
      .required('Choose what kind of bay it is.'),
    position: numberInRange({ min: 1, max: Math.max(1, bayCount), whole: true }),
    active: yup.boolean().required(),
  });
}

export function newBayValues(): BayFormValues {
  return { name: '', kind: 'hoist', position: '', active: true };
}

export function bayValues(bay: Bay): BayFormValues {
  return { name: bay.name, kind: bay.kind, position: String(bay.position), active: bay.active };
}

export function createBayRequest(values: BayFormValues): CreateBayRequest {
  return { name: values.name.trim(), kind: values.kind };
}

/** Only what changed is sent. */
export function updateBayRequest(bay: Bay, values: BayFormValues): UpdateBayRequest {
  const changes: UpdateBayRequest = {};
  const name = values.name.trim();
  if (name !== bay.name) changes.name = name;
  if (values.kind !== bay.kind) changes.kind = values.kind;
  const position = Number(values.position.trim());
  if (values.position.trim() && position !== bay.position) changes.position = position;
  if (values.active !== bay.active) changes.active = values.active;
  return changes;
}
