/**
 * The one validation path for a product's fields: POST and PATCH (after merging into the stored
 * product) and every row of a CSV import go through validateProductFields.
 */
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import type { FieldErrors } from '../common/errors/field-errors.exception';
import { toFieldErrors } from '../common/pipes/validation.pipe';
import { ProductFieldsDto } from './dto/create-product.dto';
import type { ProductFields } from './entities/product.entity';
import { validateProductAttributes } from './product-attributes';
import { isProductKind } from './product-kinds';

export type ProductValidation =
  { ok: true; fields: ProductFields } | { ok: false; fieldErrors: FieldErrors };

export function validateProductFields(candidate: Record<string, unknown>): ProductValidation {
  const dto = plainToInstance(ProductFieldsDto, candidate);
  const errors = validateSync(dto, {
    whitelist: true,
    forbidNonWhitelisted: true,
    stopAtFirstError: true,
    validationError: { target: false, value: false },
  });
  const fieldErrors = toFieldErrors(errors);
  const attributes =
    isProductKind(dto.kind) && fieldErrors.attributes === undefined
      ? validateProductAttributes(dto.kind, dto.attributes)
      : null;
  if (attributes && !attributes.ok) Object.assign(fieldErrors, attributes.fieldErrors);
  if (Object.keys(fieldErrors).length > 0 || !attributes?.ok) return { ok: false, fieldErrors };
  return {
    ok: true,
    fields: {
      sku: dto.sku,
      kind: dto.kind,
      name: dto.name,
      brand: dto.brand,
      priceCents: dto.priceCents,
      labourMinutes: dto.labourMinutes,
      bayKind: dto.bayKind ?? null,
      stockQty: dto.stockQty,
      leadDays: dto.leadDays,
      active: dto.active,
      attributes: attributes.attributes,
    },
  };
}
