import { Entity, Index, Property } from '@mikro-orm/core';
import { sameJson } from '../../common/same-json';
import { BaseEntity } from '../../database/base.entity';
import type { RuleKey, RuleLimit, RuleSetLimits, RuleSwitch } from '../../fitment/rule-set-limits';

/** The stored limits: every rule key of the engine's rule set (name and jurisdiction are columns). */
export type StoredRuleLimits = Record<RuleKey, RuleLimit | RuleSwitch>;

/** Splits an engine rule set into the columns and the stored limits. */
export function storedLimitsOf(ruleSet: RuleSetLimits): StoredRuleLimits {
  const { name: _name, jurisdiction: _jurisdiction, ...limits } = ruleSet;
  return limits;
}

/** Modification limits of one jurisdiction, as data the fit report applies. */
@Entity()
@Index({
  name: 'rule_set_single_default_index',
  expression:
    'create unique index "rule_set_single_default_index" on "rule_set" ("is_default") where "is_default"',
})
export class RuleSet extends BaseEntity<'description' | 'isDefault'> {
  @Property({ type: 'string', length: 80, unique: true })
  name: string;

  @Property({ type: 'string', length: 120 })
  jurisdiction: string;

  @Property({ type: 'text', default: '' })
  description: string = '';

  /** The rule set the fit report uses when none is named; at most one (a partial unique index). */
  @Property({ type: 'boolean', default: false })
  isDefault: boolean = false;

  /** Validated with validateRuleSetLimits before every write and every use. */
  @Property({ type: 'json' })
  limits: StoredRuleLimits;

  /** Replaces the limits only when they differ (jsonb reorders keys on the way back). */
  setLimits(limits: StoredRuleLimits): void {
    if (!sameJson(this.limits, limits)) this.limits = limits;
  }

  constructor(name: string, jurisdiction: string, limits: StoredRuleLimits) {
    super();
    this.name = name;
    this.jurisdiction = jurisdiction;
    this.limits = limits;
  }

  /** The engine's view: columns and limits together (still to be validated before use). */
  toEngineCandidate(): Record<string, unknown> {
    return { name: this.name, jurisdiction: this.jurisdiction, ...this.limits };
  }
}
