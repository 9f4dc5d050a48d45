/**
 * Reading the provider's bracket-notation parameters (`line_items[0][price_data][unit_amount]=…`)
 * after `qs` has turned them into nested objects. Every value arrives as a string; these helpers
 * check and convert it, and name the offending parameter the way the provider does.
 */
import qs from 'qs';
import { missingParam, paramError, unknownParam } from './errors';
import type { Metadata } from './store';

export type ParamValue = undefined | string | ParamValue[] | { [key: string]: ParamValue };
export type Params = { [key: string]: ParamValue };

const QS_OPTIONS = {
  depth: 10,
  arrayLimit: 100,
  parameterLimit: 2000,
  allowPrototypes: false,
} as const;

export function parseParams(text: string): Params {
  return qs.parse(text, QS_OPTIONS) as Params;
}

/** The same parameters always give the same text, whatever order they were sent in. */
export function canonicalParams(params: Params): string {
  const sortKeys = (value: ParamValue): unknown => {
    if (Array.isArray(value)) return value.map(sortKeys);
    if (value && typeof value === 'object') {
      return Object.fromEntries(
        Object.keys(value)
          .sort()
          .map((key) => [key, sortKeys(value[key])]),
      );
    }
    return value;
  };
  return JSON.stringify(sortKeys(params));
}

export function isHash(value: ParamValue): value is { [key: string]: ParamValue } {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function rejectUnknown(hash: Params, allowed: readonly string[], prefix = ''): void {
  for (const key of Object.keys(hash)) {
    if (!allowed.includes(key)) throw unknownParam(prefix ? `${prefix}[${key}]` : key);
  }
}

export function hashParam(value: ParamValue, param: string): Params {
  if (!isHash(value)) throw paramError(param, `Invalid object: ${param} must be a hash.`);
  return value;
}

/** An array sent as `x[0]=…&x[1]=…` (qs may hand back either an array or an indexed hash). */
export function arrayParam(value: ParamValue, param: string): ParamValue[] {
  if (Array.isArray(value)) return value;
  if (isHash(value)) {
    const keys = Object.keys(value);
    if (keys.every((key) => /^\d+$/.test(key))) {
      return keys.sort((a, b) => Number(a) - Number(b)).map((key) => value[key]);
    }
  }
  throw paramError(param, `Invalid array: ${param} must be a list.`);
}

export function stringParam(
  value: ParamValue,
  param: string,
  { required = false, maxLength = 5000 } = {},
): string | undefined {
  if (value === undefined || value === '') {
    if (required) throw missingParam(param);
    return undefined;
  }
  if (typeof value !== 'string') throw paramError(param, `Invalid string: ${param}.`);
  if (value.length > maxLength) {
    throw paramError(
      param,
      `Invalid string: ${param} must be at most ${maxLength} characters long.`,
      'string_too_long',
    );
  }
  return value;
}

export function integerParam(
  value: ParamValue,
  param: string,
  { required = false, min = 0, max = Number.MAX_SAFE_INTEGER } = {},
): number | undefined {
  if (value === undefined || value === '') {
    if (required) throw missingParam(param);
    return undefined;
  }
  if (typeof value !== 'string' || !/^-?\d+$/.test(value)) {
    throw paramError(param, `Invalid integer: ${typeof value === 'string' ? value : param}`);
  }
  const number = Number(value);
  if (!Number.isSafeInteger(number) || number < min || number > max) {
    throw paramError(
      param,
      min === 1 && max === Number.MAX_SAFE_INTEGER
        ? `Invalid positive integer: ${param}`
        : `Invalid integer: ${param} must be between ${min} and ${max}.`,
      'parameter_invalid_integer',
    );
  }
  return number;
}

export function urlParam(value: ParamValue, param: string): string | undefined {
  const text = stringParam(value, param, { maxLength: 5000 });
  if (text === undefined) return undefined;
  // The provider's {CHECKOUT_SESSION_ID} placeholder is not a valid URL character; check without it.
  const probe = text.replaceAll('{CHECKOUT_SESSION_ID}', 'placeholder');
  let url: URL;
  try {
    url = new URL(probe);
  } catch {
    throw paramError(param, `Not a valid URL`, 'url_invalid');
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    throw paramError(param, `Not a valid URL`, 'url_invalid');
  }
  return text;
}

/**
 * Metadata as the provider limits it (From memory: at most 50 keys, key names up to 40
 * characters without square brackets, values up to 500 characters). An empty value unsets a key.
 */
export function metadataParam(value: ParamValue, param: string): Metadata {
  if (value === undefined || value === '') return {};
  const hash = hashParam(value, param);
  const out: Metadata = {};
  for (const [key, raw] of Object.entries(hash)) {
    if (key.length > 40 || /[[\]]/.test(key)) {
      throw paramError(
        `${param}[${key}]`,
        `Invalid metadata: keys must be at most 40 characters without square brackets.`,
      );
    }
    if (typeof raw !== 'string') {
      throw paramError(`${param}[${key}]`, `Invalid metadata: values must be strings.`);
    }
    if (raw.length > 500) {
      throw paramError(
        `${param}[${key}]`,
        `Invalid metadata: values must be at most 500 characters.`,
      );
    }
    if (raw !== '') out[key] = raw;
  }
  if (Object.keys(out).length > 50) {
    throw paramError(param, `Invalid metadata: at most 50 keys are allowed.`);
  }
  return out;
}

/** `expand[]=payment_intent` or `expand[0]=payment_intent`; only the listed fields expand. */
export function expandParam(value: ParamValue, allowed: readonly string[]): string[] {
  if (value === undefined || value === '') return [];
  const list = typeof value === 'string' ? [value] : arrayParam(value, 'expand');
  return list.map((item, index) => {
    if (typeof item !== 'string') throw paramError(`expand[${index}]`, 'Invalid string: expand');
    if (!allowed.includes(item)) {
      throw paramError(`expand[${index}]`, `This property cannot be expanded (${item}).`);
    }
    return item;
  });
}

export function enumParam<T extends string>(
  value: ParamValue,
  param: string,
  allowed: readonly T[],
): T | undefined {
  const text = stringParam(value, param);
  if (text === undefined) return undefined;
  if (!(allowed as readonly string[]).includes(text)) {
    const choices =
      allowed.length > 1
        ? `${allowed.slice(0, -1).join(', ')}, or ${allowed[allowed.length - 1]}`
        : allowed[0];
    throw paramError(param, `Invalid ${param}: must be one of ${choices}`);
  }
  return text as T;
}
