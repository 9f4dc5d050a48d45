/**
 * The local stack behind `npm start`, `npm run dev` and `npm test` (scripts/bootstrap.sh has
 * already installed npm packages and PostgreSQL). See README.md and DEVELOPERS.md.
 */
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { buildIfChanged } from './lib/build';
import { log, StackError } from './lib/log';
import { assertPortFree, waitForHttp } from './lib/ports';
import * as postgres from './lib/postgres';
import { run, startService, stopServices, type Service } from './lib/processes';
import { summarise, type SuiteResult } from './lib/test-report';

type Mode = 'start' | 'dev' | 'test';

const ROOT = process.cwd();
const DATA = join(ROOT, '.data');

function portFrom(variable: string, fallback: number): number {
  const raw = process.env[variable];
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new StackError(`${variable} must be a port number between 1 and 65535 (got "${raw}").`);
  }
  return port;
}

const pg: postgres.PostgresSettings = {
  dataDir: join(DATA, 'pg'),
  port: portFrom('PG_PORT', 54329),
  user: 'liftwright',
  password: 'liftwright',
};

const DEMO_SIGN_INS = [
  ['manager', 'manager@liftwright.example', 'manager-demo-1'],
  ['desk', 'desk@liftwright.example', 'desk-demo-1'],
  ['tech', 'tech@liftwright.example', 'tech-demo-1'],
  ['customer', 'customer@liftwright.example', 'customer-demo-1'],
] as const;

function sessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = join(DATA, 'session-secret');
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

function buildApi(): void {
  buildIfChanged({
    root: ROOT,
    name: 'the API',
    inputs: [
      'api/src',
      'api/package.json',
      'api/tsconfig.json',
      'api/tsconfig.build.json',
      'package-lock.json',
    ],
    outDir: 'api/dist',
    // A clean build, so that a deleted source (a migration, say) leaves nothing behind in dist/.
    command: ['bash', '-c', 'rm -rf api/dist && npm run build --silent -w api'],
  });
}

function buildWeb(): void {
  buildIfChanged({
    root: ROOT,
    name: 'the web app',
    inputs: [
      'web/src',
      'web/index.html',
      'web/public',
      'web/vite.config.ts',
      'web/package.json',
      'web/tsconfig.json',
      'package-lock.json',
    ],
    outDir: 'web/dist',
    command: ['npm', 'run', 'build', '--silent', '-w', 'web'],
  });
}

interface Ports {
  app: number;
  smtp: number;
  inbox: number;
  /** The payment provider's local stand-in (fakes/payments). */
  payments: number;
}

/**
 * The keys the API and the payments stand-in share: random, made once per `.data/` (like the
 * session secret), in the provider's formats (sk_test_…, whsec_…).
 */
function paymentsSecrets(): { secretKey: string; webhookSecret: string } {
  const file = join(DATA, 'payments-secrets.json');
  if (!existsSync(file)) {
    const secrets = {
      secretKey: `sk_test_${randomBytes(24).toString('hex')}`,
      webhookSecret: `whsec_${randomBytes(24).toString('hex')}`,
    };
    writeFileSync(file, JSON.stringify(secrets), { mode: 0o600 });
  }
  return JSON.parse(readFileSync(file, 'utf8')) as { secretKey: string; webhookSecret: string };
}

function apiEnv(
  database: string,
  ports: Ports,
  publicUrl: string,
  nodeEnv: string,
): NodeJS.ProcessEnv {
  return {
    NODE_ENV: nodeEnv,
    PORT: String(ports.app),
    DATABASE_URL: postgres.serverUrl(pg, database),
    SESSION_SECRET: sessionSecret(),
    PUBLIC_URL: publicUrl,
    SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
    WEB_DIST_DIR: join(ROOT, 'web', 'dist'),
    // Customer photos: outside the web root, one folder per database so tests start empty.
    UPLOAD_DIR: join(DATA, 'uploads', database),
    // The provider's official SDK, pointed at the local stand-in by configuration only.
    PAYMENTS_API_URL: `http://127.0.0.1:${ports.payments}`,
    PAYMENTS_SECRET_KEY: paymentsSecrets().secretKey,
    PAYMENTS_WEBHOOK_SECRET: paymentsSecrets().webhookSecret,
  };
}

/** fakes/payments: checkout sessions, a test checkout page and signed webhooks to the API. */
async function startPayments(
  ports: Ports,
  stateFile: string,
  echo: boolean,
  varPrefix: string,
): Promise<Service> {
  await assertPortFree(ports.payments, `${varPrefix}PAYMENTS_PORT`, 'the payments stand-in');
  mkdirSync(dirname(stateFile), { recursive: true });
  const secrets = paymentsSecrets();
  const service = startService({
    name: 'payments',
    // One process (tsx as a loader, not its CLI), so stopping the stack stops the stand-in too.
    command: 'node',
    args: ['--import', 'tsx', join(ROOT, 'fakes', 'payments', 'src', 'server.ts')],
    env: {
      PAYMENTS_PORT: String(ports.payments),
      PAYMENTS_HOST: '127.0.0.1',
      PAYMENTS_SECRET_KEY: secrets.secretKey,
      PAYMENTS_WEBHOOK_SECRET: secrets.webhookSecret,
      PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${ports.app}/api/payments/webhook`,
      PAYMENTS_STATE_FILE: stateFile,
    },
    logFile: join(DATA, 'logs', 'payments.log'),
    echo,
  });
  await waitForHttp(`http://127.0.0.1:${ports.payments}/__fake/health`, 30_000, service.alive);
  return service;
}

async function migrateAndSeed(env: NodeJS.ProcessEnv): Promise<void> {
  log.step('Applying database migrations');
  if ((await run('node', ['api/dist/database/cli.js', 'migrate'], env)) !== 0) {
    throw new StackError('Migrations failed (see above).');
  }
  log.step('Loading the demo data');
  if ((await run('node', ['api/dist/database/cli.js', 'seed'], env)) !== 0) {
    throw new StackError('Loading the demo data failed (see above).');
  }
}

async function startInbox(
  ports: Ports,
  mailDir: string,
  echo: boolean,
  varPrefix: string,
): Promise<Service> {
  await assertPortFree(ports.smtp, `${varPrefix}MAIL_SMTP_PORT`, 'the e-mail catcher (SMTP)');
  await assertPortFree(ports.inbox, `${varPrefix}MAIL_WEB_PORT`, 'the e-mail catcher (web inbox)');
  mkdirSync(mailDir, { recursive: true });
  const service = startService({
    name: 'mail',
    command: 'node',
    args: [
      join(ROOT, 'node_modules', 'maildev', 'bin', 'maildev'),
      '--smtp',
      String(ports.smtp),
      '--web',
      String(ports.inbox),
      '--ip',
      '127.0.0.1',
      '--web-ip',
      '127.0.0.1',
      '--mail-directory',
      mailDir,
      '--silent',
    ],
    logFile: join(DATA, 'logs', 'mail.log'),
    echo,
  });
  await waitForHttp(`http://127.0.0.1:${ports.inbox}/healthz`, 20_000, service.alive);
  return service;
}

async function startApi(
  env: NodeJS.ProcessEnv,
  ports: Ports,
  echo: boolean,
  portVar: string,
): Promise<Service> {
  await assertPortFree(ports.app, portVar, 'the app and API');
  const service = startService({
    name: 'api',
    command: 'node',
    args: ['--enable-source-maps', 'api/dist/main.js'],
    env,
    logFile: join(DATA, 'logs', 'api.log'),
    echo,
  });
  await waitForHttp(`http://127.0.0.1:${ports.app}/api/health/ready`, 60_000, service.alive);
  return service;
}

function banner(appUrl: string, inboxUrl: string, extra: string[] = []): void {
  const lines = [
    '',
    log.bold('Liftwright is running'),
    `  App:            ${appUrl}`,
    `  API docs:       ${appUrl.replace(/\/$/, '')}/api/docs`,
    `  E-mail inbox:   ${inboxUrl}`,
    ...extra,
    '',
    '  Demo sign-ins (fictional):',
    ...DEMO_SIGN_INS.map(
      ([role, email, password]) => `    ${role.padEnd(9)} ${email.padEnd(30)} ${password}`,
    ),
    '',
    '  Logs: .data/logs/ (api.log, mail.log, payments.log); PostgreSQL: .data/pg/server.log',
    '  Ctrl-C stops everything.',
    '',
  ];
  console.log(lines.join('\n'));
}

let startedPostgres = false;
let shuttingDown = false;

async function shutdown(code: number): Promise<never> {
  if (!shuttingDown) {
    shuttingDown = true;
    await stopServices();
    if (startedPostgres) postgres.stop(pg);
    else if (postgres.isInitialised(pg) && postgres.isRunning(pg))
      log.warn('PostgreSQL was running before this command and is left running.');
  }
  process.exit(code);
}

async function untilInterrupted(services: Service[]): Promise<never> {
  const exitedEarly = Promise.race(
    services.map((s) => s.exited.then((code) => ({ name: s.name, code }))),
  );
  const signalled = new Promise<null>((resolve) => {
    process.once('SIGINT', () => resolve(null));
    process.once('SIGTERM', () => resolve(null));
  });
  const first = await Promise.race([exitedEarly, signalled]);
  if (first) {
    log.fail(
      `${first.name} exited (code ${first.code}); stopping the rest. Logs: .data/logs/${first.name}.log`,
    );
    return shutdown(1);
  }
  console.log('');
  log.step('Stopping');
  return shutdown(0);
}

async function startStack(mode: 'start' | 'dev'): Promise<never> {
  const ports: Ports = {
    app: portFrom('PORT', 4400),
    smtp: portFrom('MAIL_SMTP_PORT', 1025),
    inbox: portFrom('MAIL_WEB_PORT', 1080),
    payments: portFrom('PAYMENTS_PORT', 12111),
  };
  const devPort = portFrom('DEV_PORT', 5173);
  const appUrl = mode === 'dev' ? `http://127.0.0.1:${devPort}/` : `http://127.0.0.1:${ports.app}/`;
  const inboxUrl = `http://127.0.0.1:${ports.inbox}/`;
  mkdirSync(DATA, { recursive: true });

  startedPostgres = await postgres.ensureRunning(pg);
  if (await postgres.ensureDatabase(pg, 'liftwright')) log.ok('Created database liftwright');
  buildApi();
  const env = apiEnv(
    'liftwright',
    ports,
    appUrl.replace(/\/$/, ''),
    mode === 'dev' ? 'development' : 'production',
  );
  await migrateAndSeed(env);
  const services: Service[] = [];
  services.push(await startInbox(ports, join(DATA, 'mail'), false, ''));
  services.push(await startPayments(ports, join(DATA, 'payments', 'state.json'), false, ''));
  if (mode === 'start') {
    buildWeb();
    services.push(await startApi(env, ports, false, 'PORT'));
  } else {
    services.push(await startApi({ ...env, WEB_DIST_DIR: '' }, ports, true, 'PORT'));
    await assertPortFree(devPort, 'DEV_PORT', 'the Vite dev server');
    services.push(
      startService({
        name: 'web',
        command: 'npx',
        args: ['vite', '--host', '127.0.0.1', '--port', String(devPort), '--strictPort'],
        cwd: join(ROOT, 'web'),
        env: { API_PORT: String(ports.app) },
        logFile: join(DATA, 'logs', 'web.log'),
        echo: true,
      }),
    );
    await waitForHttp(appUrl, 30_000, services[services.length - 1].alive);
  }
  banner(appUrl, inboxUrl, [
    ...(mode === 'dev' ? [`  API (direct):   http://127.0.0.1:${ports.app}/api`] : []),
    `  Payments:       http://127.0.0.1:${ports.payments}/ (local stand-in; test cards: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined)`,
  ]);
  return untilInterrupted(services);
}

async function vitestSuite(
  name: string,
  workspace: string,
  env: NodeJS.ProcessEnv,
): Promise<SuiteResult> {
  const reportFile = join(DATA, 'test-results', `${name}.json`);
  rmSync(reportFile, { force: true });
  mkdirSync(join(DATA, 'test-results'), { recursive: true });
  log.step(`Running the ${name} tests`);
  const code = await run(
    'npx',
    ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${reportFile}`],
    env,
    join(ROOT, workspace),
  );
  return { name, code, reportFile };
}

async function testStack(): Promise<never> {
  const started = Date.now();
  const ports: Ports = {
    app: portFrom('TEST_PORT', 4410),
    smtp: portFrom('TEST_MAIL_SMTP_PORT', 1026),
    inbox: portFrom('TEST_MAIL_WEB_PORT', 1081),
    payments: portFrom('TEST_PAYMENTS_PORT', 12112),
  };
  const appUrl = `http://127.0.0.1:${ports.app}`;
  mkdirSync(DATA, { recursive: true });
  const results: SuiteResult[] = [];
  const checks: { name: string; code: number }[] = [];

  log.step('Type-checking');
  checks.push({ name: 'typecheck', code: await run('npm', ['run', '--silent', 'typecheck']) });
  log.step('Linting');
  checks.push({ name: 'lint', code: await run('npm', ['run', '--silent', 'lint']) });

  startedPostgres = await postgres.ensureRunning(pg);
  // The API suite builds its app in-process and serves no web build.
  const testEnv = { ...apiEnv('liftwright_test', ports, appUrl, 'test'), WEB_DIST_DIR: undefined };
  results.push(await vitestSuite('api', 'api', testEnv));
  // The web app's unit tests (pure helpers: formatting, form rules); no server needed.
  results.push(await vitestSuite('web', 'web', {}));
  // The payments stand-in against the provider's official SDK (it starts its own servers).
  results.push(await vitestSuite('fakes', 'fakes', {}));

  try {
    buildApi();
    buildWeb();
    // A fresh database for the browser journeys, migrated and seeded exactly as `npm start` does.
    await postgres.recreateDatabase(pg, 'liftwright_e2e');
    const e2eEnv = apiEnv('liftwright_e2e', ports, appUrl, 'production');
    rmSync(e2eEnv.UPLOAD_DIR as string, { recursive: true, force: true });
    await migrateAndSeed(e2eEnv);
    log.step('Checking that the entities and the committed migrations agree');
    checks.push({
      name: 'migration check',
      code: await run('node', ['api/dist/database/cli.js', 'check'], e2eEnv),
    });
    const mailDir = join(DATA, 'mail-e2e');
    rmSync(mailDir, { recursive: true, force: true });
    await startInbox(ports, mailDir, false, 'TEST_');
    const paymentsState = join(DATA, 'payments-e2e', 'state.json');
    rmSync(paymentsState, { force: true });
    await startPayments(ports, paymentsState, false, 'TEST_');
    await startApi(e2eEnv, ports, false, 'TEST_PORT');
    results.push(
      await vitestSuite('e2e', 'e2e', {
        E2E_BASE_URL: appUrl,
        E2E_INBOX_URL: `http://127.0.0.1:${ports.inbox}`,
        E2E_PAYMENTS_URL: `http://127.0.0.1:${ports.payments}`,
        E2E_DATABASE_URL: e2eEnv.DATABASE_URL,
      }),
    );
  } catch (error) {
    log.fail(
      `The end-to-end stack did not start: ${(error as Error).message} (logs in .data/logs/)`,
    );
    results.push({ name: 'e2e', code: 1, reportFile: '' });
  }

  const { passed, failed, problems } = summarise(results);
  for (const check of checks) if (check.code !== 0) problems.push(`${check.name} failed`);
  for (const problem of problems) log.fail(problem);
  log.step(`Finished in ${Math.round((Date.now() - started) / 1000)} s`);
  // A check that failed or a suite that could not run counts as one failure in the summary line.
  const failures = failed + problems.length;
  console.log(`${passed} passed, ${failures} failed`);
  return shutdown(failures === 0 ? 0 : 1);
}

async function main(): Promise<void> {
  const mode = (process.argv[2] ?? 'start') as Mode;
  if (mode === 'test') await testStack();
  else if (mode === 'start' || mode === 'dev') await startStack(mode);
  else throw new StackError(`Unknown mode "${mode}": use start, dev or test.`);
}

main().catch(async (error: unknown) => {
  if (error instanceof StackError) log.fail(error.message);
  else console.error(error);
  await shutdown(1);
});
