/**
 * The stand-in's settings, read from the environment (see README.md). A missing or malformed
 * required value stops the start with one message per problem.
 */

export interface PaymentsConfig {
  host: string;
  /** 0 picks a free port (the tests do this). */
  port: number;
  /** Base of the hosted checkout page's address; undefined means http://<host>:<port>. */
  publicUrl?: string;
  secretKey: string;
  webhookUrl: string;
  webhookSecret: string;
  /** JSON file that keeps the state across restarts; undefined keeps it in memory. */
  stateFile?: string;
  retryBaseMs: number;
  retryMaxMs: number;
  /** How many times a failed delivery is retried after its first attempt; null retries forever. */
  retryLimit: number | null;
  /** How long one delivery attempt may take before it counts as failed. */
  webhookTimeoutMs: number;
}

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`The payments stand-in cannot start:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

type Env = Record<string, string | undefined>;

function integerFrom(
  env: Env,
  name: string,
  fallback: number,
  min: number,
  max: number,
  problems: string[],
): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (!/^\d+$/.test(raw) || Number(raw) < min || Number(raw) > max) {
    problems.push(`${name} must be a whole number from ${min} to ${max} (got "${raw}").`);
    return fallback;
  }
  return Number(raw);
}

function httpUrl(value: string): boolean {
  try {
    const url = new URL(value);
    return url.protocol === 'http:' || url.protocol === 'https:';
  } catch {
    return false;
  }
}

export function configFromEnv(env: Env = process.env): PaymentsConfig {
  const problems: string[] = [];

  const secretKey = env.PAYMENTS_SECRET_KEY ?? '';
  if (secretKey === '') problems.push('PAYMENTS_SECRET_KEY is required (a test key: sk_test_…).');
  else if (!/^sk_test_[A-Za-z0-9_]+$/.test(secretKey))
    problems.push('PAYMENTS_SECRET_KEY must be a test secret key starting with sk_test_.');

  const webhookUrl = env.PAYMENTS_WEBHOOK_URL ?? '';
  if (webhookUrl === '')
    problems.push('PAYMENTS_WEBHOOK_URL is required (where events are POSTed).');
  else if (!httpUrl(webhookUrl))
    problems.push(`PAYMENTS_WEBHOOK_URL must be an http(s) URL (got "${webhookUrl}").`);

  const webhookSecret = env.PAYMENTS_WEBHOOK_SECRET ?? '';
  if (webhookSecret === '')
    problems.push('PAYMENTS_WEBHOOK_SECRET is required (the signing secret: whsec_…).');
  else if (!/^whsec_[A-Za-z0-9_]+$/.test(webhookSecret))
    problems.push('PAYMENTS_WEBHOOK_SECRET must start with whsec_.');

  const port = integerFrom(env, 'PAYMENTS_PORT', 12111, 0, 65535, problems);
  const host = env.PAYMENTS_HOST || '127.0.0.1';

  const publicUrl = env.PAYMENTS_PUBLIC_URL || undefined;
  if (publicUrl !== undefined && !httpUrl(publicUrl))
    problems.push(`PAYMENTS_PUBLIC_URL must be an http(s) URL (got "${publicUrl}").`);

  const retryBaseMs = integerFrom(env, 'PAYMENTS_RETRY_BASE_MS', 1000, 1, 86_400_000, problems);
  const retryMaxMs = integerFrom(env, 'PAYMENTS_RETRY_MAX_MS', 60_000, 1, 86_400_000, problems);
  if (retryMaxMs < retryBaseMs)
    problems.push('PAYMENTS_RETRY_MAX_MS must not be smaller than PAYMENTS_RETRY_BASE_MS.');
  const limitRaw = env.PAYMENTS_RETRY_LIMIT;
  const retryLimit =
    limitRaw === undefined || limitRaw === ''
      ? null
      : integerFrom(env, 'PAYMENTS_RETRY_LIMIT', 0, 0, 1_000_000, problems);

  if (problems.length > 0) throw new ConfigError(problems);
  return {
    host,
    port,
    publicUrl: publicUrl?.replace(/\/+$/, ''),
    secretKey,
    webhookUrl,
    webhookSecret,
    stateFile: env.PAYMENTS_STATE_FILE || undefined,
    retryBaseMs,
    retryMaxMs,
    retryLimit,
    webhookTimeoutMs: 10_000,
  };
}
