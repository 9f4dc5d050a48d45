/**
 * `npm run bench:quote`: how fast the API prices a 10-line package, next to its cheapest route.
 *
 * Needs a running API (it starts nothing itself): `npm start`, then this. Builds a package from
 * the live catalogue the way the planner does (POST /api/planner/options, step by step), checks
 * that one POST /api/quotes/preview answers 200, then measures GET /api/health/live and
 * POST /api/quotes/preview with autocannon at the same concurrency, one after the other: the
 * preview twice, with a session cookie and CSRF token (as a signed-in planner sends it) and
 * without (as a guest's planner sends it: the route computes only and needs neither).
 * Prints a table and writes docs/bench/quote-<UTC stamp>.json. It is a measurement: the exit
 * code is 0 whether the targets are met or not, and 1 only when the run itself failed.
 *
 * Environment: BENCH_URL (http://127.0.0.1:4400), BENCH_CONNECTIONS (10), BENCH_DURATION
 * (seconds per route, 10), BENCH_WARMUP (seconds per route, 3), BENCH_VEHICLE_MODEL_ID (the
 * vehicle to build for; default: the first model a 10-line package can be built for).
 */
import { cpus } from 'node:os';
import autocannon from 'autocannon';
import {
  assertReachable,
  baseUrl,
  BenchError,
  loadAverage,
  machineInfo,
  runMain,
  table,
  writeResult,
} from './lib';

/** Read in main(), so a bad value is reported as one clear line. */
let connections = 10;
let duration = 10;
let warmup = 3;
const LINES = 10;

/** The targets of the issue: preview keeps at least half the throughput of the bare route. */
const TARGETS = { minRatio: 0.5, maxP99Ms: 25 };

type Verdict = 'ok' | 'advisory' | 'needs-certification' | 'does-not-fit';
type Kind = 'wheel' | 'tyre' | 'suspension-kit' | 'component' | 'service';

interface VehicleModel {
  id: string;
  make: string;
  model: string;
  variant: string;
}
interface PlannerOption {
  product: { id: string; sku: string; name: string; kind: Kind; attributes: { role?: string } };
  verdict: Verdict;
  suggestedBy: string[];
}
interface PackageItem {
  productId: string;
  quantity: number;
}
interface PackageBody {
  vehicleModelId: string;
  uses: string[];
  constantLoadKg: number;
  items: PackageItem[];
}
interface PreviewResponse {
  price: { totalCents: number; depositCents: number; lines: unknown[] };
  fitReport: { verdict: Verdict };
}

/** The policy charges these two services itself; the API refuses them as package lines. */
const POLICY_SERVICES = new Set(['fitting-balancing', 'tyre-disposal']);

function positiveInt(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 1)
    throw new BenchError(`${name} must be a whole number ≥ 1`);
  return value;
}

/** An anonymous session: its cookie and CSRF token, as the web app gets them. */
async function openSession(): Promise<{ cookie: string; csrfToken: string }> {
  const response = await fetch(`${baseUrl}/api/auth/csrf`);
  if (!response.ok) throw new BenchError(`GET /api/auth/csrf answered ${response.status}`);
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  const cookie = response.headers
    .getSetCookie()
    .map((header) => header.split(';')[0])
    .join('; ');
  if (!cookie) throw new BenchError('GET /api/auth/csrf set no session cookie');
  return { cookie, csrfToken };
}

async function api<T>(
  path: string,
  session: { cookie: string; csrfToken: string },
  body?: unknown,
): Promise<{ status: number; body: T }> {
  const response = await fetch(`${baseUrl}${path}`, {
    method: body === undefined ? 'GET' : 'POST',
    headers: {
      accept: 'application/json',
      cookie: session.cookie,
      ...(body === undefined
        ? {}
        : { 'content-type': 'application/json', 'x-csrf-token': session.csrfToken }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  return { status: response.status, body: (text ? JSON.parse(text) : null) as T };
}

async function options(
  session: { cookie: string; csrfToken: string },
  body: PackageBody,
  kind: Kind,
): Promise<PlannerOption[]> {
  const { vehicleModelId, constantLoadKg, items } = body;
  const answer = await api<{ items: PlannerOption[] }>('/api/planner/options', session, {
    vehicleModelId,
    constantLoadKg,
    items,
    kind,
  });
  if (answer.status === 404) {
    throw new BenchError(
      `POST /api/planner/options answered 404: the running API has no planner yet (rebuild and restart the stack).`,
    );
  }
  if (answer.status !== 200) {
    throw new BenchError(
      `POST /api/planner/options (${kind}) answered ${answer.status}: ${JSON.stringify(answer.body)}`,
    );
  }
  return answer.body.items.filter((option) => option.verdict !== 'does-not-fit');
}

/**
 * A 10-line package for one vehicle, chosen as a customer would in the planner: a kit, wheels
 * (4) and tyres (4) that fit with what is already chosen, then the suggested companions first,
 * then other components and services that fit, one per role. Null when this vehicle cannot make
 * 10 lines.
 */
async function buildPackage(
  session: { cookie: string; csrfToken: string },
  vehicle: VehicleModel,
): Promise<{ body: PackageBody; names: string[] } | null> {
  const body: PackageBody = {
    vehicleModelId: vehicle.id,
    uses: ['daily', 'touring'],
    constantLoadKg: 80,
    items: [],
  };
  const names: string[] = [];
  for (const [kind, quantity] of [
    ['suspension-kit', 1],
    ['wheel', 4],
    ['tyre', 4],
  ] as const) {
    const [best] = await options(session, body, kind);
    if (!best) return null;
    body.items.push({ productId: best.product.id, quantity });
    names.push(`${best.product.name} × ${quantity}`);
  }
  const extras = [
    ...(await options(session, body, 'component')),
    ...(await options(session, body, 'service')),
  ]
    .filter((option) => !POLICY_SERVICES.has(option.product.attributes.role ?? ''))
    // Suggested companions first (stable: otherwise the API's order, best verdict then price).
    .sort((a, b) => Number(b.suggestedBy.length > 0) - Number(a.suggestedBy.length > 0));
  // One product per role, as a customer would choose (not two sets of hub rings).
  const roles = new Set<string>();
  for (const option of extras) {
    if (body.items.length === LINES) break;
    const role = option.product.attributes.role;
    if (body.items.some((item) => item.productId === option.product.id)) continue;
    if (role && roles.has(role)) continue;
    if (role) roles.add(role);
    body.items.push({ productId: option.product.id, quantity: 1 });
    names.push(option.product.name);
  }
  return body.items.length === LINES ? { body, names } : null;
}

async function choosePackage(session: {
  cookie: string;
  csrfToken: string;
}): Promise<{ vehicle: VehicleModel; body: PackageBody; names: string[] }> {
  const models = await api<{ items: VehicleModel[] }>('/api/vehicle-models', session);
  if (models.status !== 200)
    throw new BenchError(`GET /api/vehicle-models answered ${models.status}`);
  const wanted = process.env.BENCH_VEHICLE_MODEL_ID;
  const candidates = wanted
    ? models.body.items.filter((model) => model.id === wanted)
    : models.body.items;
  if (candidates.length === 0) throw new BenchError(`No vehicle model ${wanted} in the catalogue`);
  for (const vehicle of candidates) {
    const built = await buildPackage(session, vehicle);
    if (built) return { vehicle, ...built };
  }
  throw new BenchError(`No vehicle in the catalogue fits a ${LINES}-line package`);
}

interface RouteFigures {
  route: string;
  requests: number;
  requestsPerSecond: number;
  latencyMs: { p50: number; p90: number; p99: number; max: number; mean: number };
  non2xx: number;
  errors: number;
  timeouts: number;
}

async function measure(
  route: string,
  request: {
    method: 'GET' | 'POST';
    path: string;
    headers?: Record<string, string>;
    body?: string;
  },
): Promise<RouteFigures> {
  process.stdout.write(
    `› ${route}: ${warmup} s warm-up, ${duration} s at ${connections} connections… `,
  );
  const options: autocannon.Options = {
    url: `${baseUrl}${request.path}`,
    method: request.method,
    headers: request.headers,
    body: request.body,
    connections,
  };
  // Warm-up first (JIT, connection pools, caches); its figures are thrown away.
  await autocannon({ ...options, duration: warmup });
  const result = await autocannon({ ...options, duration });
  console.log('done');
  return {
    route,
    requests: result.requests.total,
    requestsPerSecond: Math.round(result.requests.average * 10) / 10,
    latencyMs: {
      p50: result.latency.p50,
      p90: result.latency.p90,
      p99: result.latency.p99,
      max: result.latency.max,
      mean: Math.round(result.latency.mean * 100) / 100,
    },
    non2xx: result.non2xx,
    errors: result.errors,
    timeouts: result.timeouts,
  };
}

async function main(): Promise<void> {
  connections = positiveInt('BENCH_CONNECTIONS', connections);
  duration = positiveInt('BENCH_DURATION', duration);
  warmup = positiveInt('BENCH_WARMUP', warmup);
  await assertReachable();
  const session = await openSession();
  const { vehicle, body, names } = await choosePackage(session);
  const vehicleName = `${vehicle.make} ${vehicle.model} ${vehicle.variant}`;

  const check = await api<PreviewResponse>('/api/quotes/preview', session, body);
  if (check.status !== 200) {
    throw new BenchError(
      `POST /api/quotes/preview answered ${check.status} before the run: ${JSON.stringify(check.body)}`,
    );
  }
  console.log(`Package for ${vehicleName} (${body.items.length} lines):`);
  for (const name of names) console.log(`  - ${name}`);
  console.log(
    `  fit verdict ${check.body.fitReport.verdict}, ${check.body.price.lines.length} priced lines, ` +
      `total ${(check.body.price.totalCents / 100).toFixed(2)}, deposit ${(check.body.price.depositCents / 100).toFixed(2)}`,
  );

  const started = new Date();
  const loadBefore = loadAverage();
  console.log(`Load average before the run: ${loadBefore.join(', ')} (${cpus().length} cores)`);
  const live = await measure('GET /api/health/live', { method: 'GET', path: '/api/health/live' });
  // As a signed-in customer's (or any visitor's with a session) planner sends it: cookie + token.
  const preview = await measure('POST /api/quotes/preview (session)', {
    method: 'POST',
    path: '/api/quotes/preview',
    headers: {
      'content-type': 'application/json',
      cookie: session.cookie,
      'x-csrf-token': session.csrfToken,
    },
    body: JSON.stringify(body),
  });
  // As a guest's planner sends it: no cookie, no token (the route computes only).
  const previewGuest = await measure('POST /api/quotes/preview (guest)', {
    method: 'POST',
    path: '/api/quotes/preview',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });

  const ratioOf = (figures: RouteFigures) =>
    Math.round((figures.requestsPerSecond / live.requestsPerSecond) * 1000) / 1000;
  const ratio = ratioOf(preview);
  const ratioGuest = ratioOf(previewGuest);
  const failures = [live, preview, previewGuest].reduce(
    (total, figures) => total + figures.non2xx + figures.errors,
    0,
  );
  // Connection errors mean the API went away (restarted, crashed): those figures are not about
  // the route, so the run counts as failed (exit 1) after the figures are written.
  const broken = [live, preview, previewGuest].filter((figures) => figures.errors > 0);
  const reading = (ok: boolean) => (broken.length > 0 ? 'NO FIGURE' : ok ? 'PASS' : 'MISS');
  const verdicts = {
    ratio: reading(ratio >= TARGETS.minRatio),
    p99: reading(preview.latencyMs.p99 <= TARGETS.maxP99Ms),
    ratioGuest: reading(ratioGuest >= TARGETS.minRatio),
    p99Guest: reading(previewGuest.latencyMs.p99 <= TARGETS.maxP99Ms),
    non2xx: failures === 0 ? 'PASS' : 'MISS',
  };

  console.log('');
  console.log(
    table([
      ['route', 'req/s', 'p50 ms', 'p90 ms', 'p99 ms', 'max ms', 'non-2xx', 'errors'],
      ...[live, preview, previewGuest].map((figures) => [
        figures.route,
        figures.requestsPerSecond.toFixed(1),
        String(figures.latencyMs.p50),
        String(figures.latencyMs.p90),
        String(figures.latencyMs.p99),
        String(figures.latencyMs.max),
        String(figures.non2xx),
        String(figures.errors),
      ]),
    ]),
  );
  console.log('');
  console.log(
    table([
      ['target', 'measured', 'reading'],
      [`preview/live req/s ≥ ${TARGETS.minRatio} (session)`, ratio.toFixed(3), verdicts.ratio],
      [
        `preview p99 ≤ ${TARGETS.maxP99Ms} ms (session)`,
        `${preview.latencyMs.p99} ms`,
        verdicts.p99,
      ],
      [
        `preview/live req/s ≥ ${TARGETS.minRatio} (guest)`,
        ratioGuest.toFixed(3),
        verdicts.ratioGuest,
      ],
      [
        `preview p99 ≤ ${TARGETS.maxP99Ms} ms (guest)`,
        `${previewGuest.latencyMs.p99} ms`,
        verdicts.p99Guest,
      ],
      ['non-2xx and errors = 0', String(failures), verdicts.non2xx],
    ]),
  );

  const path = await writeResult('quote', started, {
    benchmark: 'quote-preview',
    measuredAt: started.toISOString(),
    baseUrl,
    machine: machineInfo(),
    loadAverageBefore: loadBefore,
    settings: { connections, durationSeconds: duration, warmupSeconds: warmup },
    package: {
      vehicleModelId: vehicle.id,
      vehicle: vehicleName,
      uses: body.uses,
      constantLoadKg: body.constantLoadKg,
      lines: names,
      items: body.items,
      fitVerdict: check.body.fitReport.verdict,
      totalCents: check.body.price.totalCents,
    },
    complete: broken.length === 0,
    routes: { live, preview, previewGuest },
    ratio,
    ratioGuest,
    targets: TARGETS,
    readings: verdicts,
  });
  console.log(`\nWrote ${path}`);
  if (broken.length > 0) {
    throw new BenchError(
      `Connection errors on ${broken.map((figures) => figures.route).join(', ')}: the API stopped ` +
        'answering during the run (restarted?). Run it again once the stack is up.',
    );
  }
}

runMain(main);
