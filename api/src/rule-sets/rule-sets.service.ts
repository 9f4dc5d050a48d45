import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, InternalServerErrorException, NotFoundException } from '@nestjs/common';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import {
  RULE_KEY_SHAPES,
  type RuleKey,
  type RuleSetLimits,
  validateRuleSetLimits,
} from '../fitment/rule-set-limits';
import { type RuleSetListResponse, RuleSetResponse } from './dto/rule-set.response';
import type { UpdateRuleSetDto } from './dto/update-rule-set.dto';
import { RuleSet, type StoredRuleLimits, storedLimitsOf } from './entities/rule-set.entity';

export const RULE_SET_NOT_FOUND = 'No rule set has this id';

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function isRuleKey(key: string): key is RuleKey {
  return Object.hasOwn(RULE_KEY_SHAPES, key);
}

function add(errors: FieldErrors, key: string, message: string): void {
  (errors[key] ??= []).push(message);
}

/**
 * Applies `{ <key>: { enabled?, value? } }` to stored limits. Returns the merged limits, or the
 * field errors ("limits.<key>.value") when any change is malformed or out of range.
 */
export function patchedLimits(
  ruleSet: RuleSet,
  changes: Record<string, unknown>,
):
  | { ok: true; limits: StoredRuleLimits; engine: RuleSetLimits }
  | { ok: false; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const merged: Record<string, unknown> = { ...ruleSet.limits };
  for (const [key, change] of Object.entries(changes)) {
    const path = `limits.${key}`;
    if (!isRuleKey(key)) {
      add(errors, path, 'is not a rule Liftwright knows');
      continue;
    }
    if (!isRecord(change)) {
      add(errors, path, 'must be an object with enabled and/or value');
      continue;
    }
    const shape = RULE_KEY_SHAPES[key];
    for (const [field, value] of Object.entries(change)) {
      if (field === 'enabled') {
        if (typeof value !== 'boolean') add(errors, `${path}.enabled`, 'must be true or false');
      } else if (field === 'value') {
        if (shape.kind === 'switch')
          add(errors, `${path}.value`, 'this rule is a switch and has no value');
        else if (typeof value !== 'number' || !Number.isFinite(value)) {
          add(errors, `${path}.value`, 'must be a number');
        }
      } else {
        add(errors, `${path}.${field}`, 'is not an expected field');
      }
    }
    merged[key] = { ...ruleSet.limits[key], ...change };
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };

  const validation = validateRuleSetLimits({
    name: ruleSet.name,
    jurisdiction: ruleSet.jurisdiction,
    ...merged,
  });
  if (!validation.ok) {
    for (const error of validation.errors) add(errors, `limits.${error.key}`, error.message);
    return { ok: false, errors };
  }
  return { ok: true, limits: storedLimitsOf(validation.ruleSet), engine: validation.ruleSet };
}

@Injectable()
export class RuleSetsService {
  constructor(private readonly em: EntityManager) {}

  async list(): Promise<RuleSetListResponse> {
    const ruleSets = await this.em.find(
      RuleSet,
      {},
      { orderBy: { isDefault: 'desc', name: 'asc' } },
    );
    return { items: ruleSets.map((ruleSet) => RuleSetResponse.from(ruleSet)) };
  }

  async get(id: string): Promise<RuleSetResponse> {
    return RuleSetResponse.from(await this.load(id));
  }

  async update(id: string, dto: UpdateRuleSetDto): Promise<RuleSetResponse> {
    const ruleSet = await this.load(id);
    const patched = patchedLimits(ruleSet, dto.limits);
    if (!patched.ok) throw new FieldErrorsException(patched.errors);
    ruleSet.setLimits(patched.limits);
    await this.em.flush();
    return RuleSetResponse.from(ruleSet);
  }

  /**
   * The engine's rule set: the named one, or the default. Unknown id → null. Stored limits are
   * validated before use; a broken stored rule set is a server fault, not the caller's.
   */
  async engineRuleSet(id?: string): Promise<RuleSetLimits | null> {
    const ruleSet = await this.em.findOne(RuleSet, id ? { id } : { isDefault: true });
    if (!ruleSet) {
      if (id) return null;
      throw new InternalServerErrorException('No default rule set is stored');
    }
    const validation = validateRuleSetLimits(ruleSet.toEngineCandidate());
    if (!validation.ok) {
      throw new InternalServerErrorException(`Rule set "${ruleSet.name}" is not valid`);
    }
    return validation.ruleSet;
  }

  private async load(id: string): Promise<RuleSet> {
    const ruleSet = await this.em.findOne(RuleSet, { id });
    if (!ruleSet) throw new NotFoundException(RULE_SET_NOT_FOUND);
    return ruleSet;
  }
}
