import { accessSync, constants, existsSync, mkdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { plainToInstance, Transform } from 'class-transformer';
import {
  IsBoolean,
  IsDefined,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  Matches,
  Max,
  MinLength,
  Min,
  ValidateBy,
  ValidationError,
  ValidationOptions,
  validateSync,
} from 'class-validator';

export const NODE_ENVS = ['development', 'test', 'production'] as const;
export type NodeEnv = (typeof NODE_ENVS)[number];

export const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'] as const;
export type LogLevel = (typeof LOG_LEVELS)[number];

export const DEFAULT_MAIL_FROM = 'Liftwright <no-reply@liftwright.example>';

function hasProtocol(value: unknown, protocols: readonly string[]): boolean {
  if (typeof value !== 'string') return false;
  try {
    const url = new URL(value);
    return protocols.includes(url.protocol) && url.hostname.length > 0;
  } catch {
    return false;
  }
}

function IsUrlWithProtocol(protocols: readonly string[], options: ValidationOptions) {
  return ValidateBy(
    {
      name: 'isUrlWithProtocol',
      validator: { validate: (value: unknown) => hasProtocol(value, protocols) },
    },
    options,
  );
}

function IsFolderWithIndexHtml(options: ValidationOptions) {
  return ValidateBy(
    {
      name: 'isFolderWithIndexHtml',
      validator: {
        validate: (value: unknown) =>
          typeof value === 'string' &&
          existsSync(value) &&
          statSync(value).isDirectory() &&
          existsSync(join(value, 'index.html')),
      },
    },
    options,
  );
}

/**
 * A folder the API can write to: created (with its parents, owner-only) when missing. Runs at
 * start-up, so a folder that cannot be made or written stops the API with a clear message
 * instead of failing the first upload.
 */
export function isWritableFolder(value: unknown): boolean {
  if (typeof value !== 'string' || value.trim() === '') return false;
  try {
    mkdirSync(value, { recursive: true, mode: 0o700 });
    if (!statSync(value).isDirectory()) return false;
    accessSync(value, constants.W_OK | constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

function IsWritableFolder(options: ValidationOptions) {
  return ValidateBy(
    { name: 'isWritableFolder', validator: { validate: isWritableFolder } },
    options,
  );
}

/** The upload folder when UPLOAD_DIR is not set: `.data/uploads` below the working directory. */
export function defaultUploadDir(): string {
  return join(process.cwd(), '.data', 'uploads');
}

/** A whole number written in decimal digits, or NaN so that @IsInt reports it. */
function toWholeNumber({ value }: { value: unknown }): unknown {
  if (typeof value === 'number') return value;
  if (typeof value === 'string' && /^\d+$/.test(value.trim())) return Number(value.trim());
  return value === undefined ? undefined : Number.NaN;
}

function toBoolean({ value }: { value: unknown }): unknown {
  if (typeof value === 'boolean') return value;
  if (typeof value !== 'string') return value;
  const normalised = value.trim().toLowerCase();
  if (normalised === 'true' || normalised === '1') return true;
  if (normalised === 'false' || normalised === '0') return false;
  return value;
}

/** The part of the environment the database tools (migrations, seeder) need. */
export class DatabaseEnvironment {
  @IsDefined({ message: '$property is required' })
  @IsUrlWithProtocol(['postgres:', 'postgresql:'], {
    message: '$property must be a postgres:// URL',
  })
  DATABASE_URL!: string;
}

/** Every variable the API reads, validated once at start-up. */
export class Environment extends DatabaseEnvironment {
  @IsIn(NODE_ENVS, { message: `$property must be one of ${NODE_ENVS.join(', ')}` })
  NODE_ENV: NodeEnv = 'development';

  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number between 1 and 65535' })
  @Min(1, { message: '$property must be a whole number between 1 and 65535' })
  @Max(65535, { message: '$property must be a whole number between 1 and 65535' })
  PORT = 4400;

  /** The address to listen on: loopback by default; 0.0.0.0 behind a load balancer. */
  @IsString({ message: '$property must be text' })
  @IsNotEmpty({ message: '$property must not be empty' })
  HOST = '127.0.0.1';

  @IsDefined({ message: '$property is required' })
  @IsString({ message: '$property must be text' })
  @MinLength(32, { message: '$property must be at least 32 characters' })
  SESSION_SECRET!: string;

  @IsDefined({ message: '$property is required' })
  @IsUrlWithProtocol(['http:', 'https:'], {
    message: '$property must be an http:// or https:// URL',
  })
  PUBLIC_URL!: string;

  @IsDefined({ message: '$property is required' })
  @IsUrlWithProtocol(['smtp:', 'smtps:'], {
    message: '$property must be an smtp:// or smtps:// URL',
  })
  SMTP_URL!: string;

  @IsString({ message: '$property must be text' })
  @IsNotEmpty({ message: '$property must not be empty' })
  MAIL_FROM = DEFAULT_MAIL_FROM;

  @IsOptional()
  @IsFolderWithIndexHtml({ message: '$property must be a folder that contains index.html' })
  WEB_DIST_DIR?: string;

  @IsIn(LOG_LEVELS, { message: `$property must be one of ${LOG_LEVELS.join(', ')}` })
  LOG_LEVEL!: LogLevel;

  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of minutes between 1 and 1440' })
  @Min(1, { message: '$property must be a whole number of minutes between 1 and 1440' })
  @Max(1440, { message: '$property must be a whole number of minutes between 1 and 1440' })
  SESSION_IDLE_MINUTES = 30;

  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of hours between 1 and 720' })
  @Min(1, { message: '$property must be a whole number of hours between 1 and 720' })
  @Max(720, { message: '$property must be a whole number of hours between 1 and 720' })
  SESSION_MAX_HOURS = 12;

  /** How often lapsed holds are marked expired and their bays released. */
  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of seconds between 1 and 3600' })
  @Min(1, { message: '$property must be a whole number of seconds between 1 and 3600' })
  @Max(3600, { message: '$property must be a whole number of seconds between 1 and 3600' })
  HOLD_SWEEP_SECONDS = 60;

  /**
   * How often confirmed bookings starting tomorrow (workshop time) get their reminder queued;
   * 0 turns the sweep off. Under NODE_ENV=test it runs only when a test calls it.
   */
  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of seconds between 0 and 86400' })
  @Min(0, { message: '$property must be a whole number of seconds between 0 and 86400' })
  @Max(86400, { message: '$property must be a whole number of seconds between 0 and 86400' })
  REMINDER_SWEEP_SECONDS = 900;

  @Transform(toBoolean)
  @IsBoolean({ message: '$property must be true or false' })
  TRUST_PROXY = false;

  /**
   * Whether this process delivers the e-mail outbox (the API: yes). Set to false for a process
   * that only queues messages; they wait in the outbox for a process that delivers.
   */
  @Transform(toBoolean)
  @IsBoolean({ message: '$property must be true or false' })
  OUTBOX_WORKER = true;

  /** How many more tries a message gets after its first failed delivery. */
  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number between 0 and 50' })
  @Min(0, { message: '$property must be a whole number between 0 and 50' })
  @Max(50, { message: '$property must be a whole number between 0 and 50' })
  OUTBOX_RETRY_LIMIT = 12;

  /** The first wait before a retry; each later wait doubles (with some random spread). */
  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of seconds between 1 and 3600' })
  @Min(1, { message: '$property must be a whole number of seconds between 1 and 3600' })
  @Max(3600, { message: '$property must be a whole number of seconds between 1 and 3600' })
  OUTBOX_RETRY_DELAY_SECONDS = 30;

  /** How often the worker looks for messages to send. */
  @Transform(toWholeNumber)
  @IsInt({ message: '$property must be a whole number of seconds between 1 and 60' })
  @Min(1, { message: '$property must be a whole number of seconds between 1 and 60' })
  @Max(60, { message: '$property must be a whole number of seconds between 1 and 60' })
  OUTBOX_POLL_SECONDS = 2;

  /**
   * Customer photos (originals and thumbnails, random names). Keep it outside the web root:
   * the files are served only through the authorised upload routes. Stored as an absolute path.
   */
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? resolve(value) : value,
  )
  @IsWritableFolder({ message: '$property must be a folder the API can create and write to' })
  UPLOAD_DIR = defaultUploadDir();

  /** The payment provider's secret API key (test or live). Never logged. */
  @IsDefined({ message: '$property is required' })
  @Matches(/^sk_(test|live)_[A-Za-z0-9_]+$/, {
    message: '$property must be a secret key starting with sk_test_ or sk_live_',
  })
  PAYMENTS_SECRET_KEY!: string;

  /** The signing secret of the webhook endpoint: events are verified with it. */
  @IsDefined({ message: '$property is required' })
  @Matches(/^whsec_[A-Za-z0-9_+/=-]+$/, {
    message: '$property must be a webhook signing secret starting with whsec_',
  })
  PAYMENTS_WEBHOOK_SECRET!: string;

  /**
   * Where the provider's API is served, when not at its usual address: the SDK takes host, port
   * and protocol from it. Unset: the provider's own API.
   */
  @IsOptional()
  @IsUrlWithProtocol(['http:', 'https:'], {
    message: '$property must be an http:// or https:// URL',
  })
  PAYMENTS_API_URL?: string;
}

type RawEnvironment = Record<string, unknown>;

/** Keep only the variables the class declares; an empty value counts as not set. */
function pick(raw: RawEnvironment, keys: readonly string[]): RawEnvironment {
  const picked: RawEnvironment = {};
  for (const key of keys) {
    const value = raw[key];
    if (value !== undefined && !(typeof value === 'string' && value.trim() === '')) {
      picked[key] = value;
    }
  }
  return picked;
}

function describeErrors(errors: ValidationError[]): string {
  const messages = errors.flatMap((error) => {
    const constraints = Object.values(error.constraints ?? {});
    // One message per variable: the first failing rule is the one to fix.
    return constraints.length > 0 ? [constraints[0]] : [];
  });
  return `Configuration error: ${messages.join('; ')}`;
}

const ENVIRONMENT_KEYS = [
  'NODE_ENV',
  'PORT',
  'HOST',
  'DATABASE_URL',
  'SESSION_SECRET',
  'PUBLIC_URL',
  'SMTP_URL',
  'MAIL_FROM',
  'WEB_DIST_DIR',
  'LOG_LEVEL',
  'SESSION_IDLE_MINUTES',
  'SESSION_MAX_HOURS',
  'HOLD_SWEEP_SECONDS',
  'REMINDER_SWEEP_SECONDS',
  'TRUST_PROXY',
  'OUTBOX_WORKER',
  'OUTBOX_RETRY_LIMIT',
  'OUTBOX_RETRY_DELAY_SECONDS',
  'OUTBOX_POLL_SECONDS',
  'UPLOAD_DIR',
  'PAYMENTS_SECRET_KEY',
  'PAYMENTS_WEBHOOK_SECRET',
  'PAYMENTS_API_URL',
] as const;

/**
 * The validate function given to ConfigModule: returns the typed environment or throws an Error
 * whose message names every variable that is missing or wrong.
 */
export function validateEnvironment(raw: RawEnvironment): Environment {
  const values = pick(raw, ENVIRONMENT_KEYS);
  if (values.LOG_LEVEL === undefined) {
    values.LOG_LEVEL = values.NODE_ENV === 'test' ? 'warn' : 'info';
  }
  const environment = plainToInstance(Environment, values, { exposeDefaultValues: true });
  const errors = validateSync(environment, {
    stopAtFirstError: true,
    validationError: { target: false },
  });
  if (errors.length > 0) throw new Error(describeErrors(errors));
  return environment;
}

/** Validates only DATABASE_URL, for the migration and seed commands. */
export function validateDatabaseEnvironment(raw: RawEnvironment): DatabaseEnvironment {
  const environment = plainToInstance(DatabaseEnvironment, pick(raw, ['DATABASE_URL']));
  const errors = validateSync(environment, {
    stopAtFirstError: true,
    validationError: { target: false },
  });
  if (errors.length > 0) throw new Error(describeErrors(errors));
  return environment;
}
