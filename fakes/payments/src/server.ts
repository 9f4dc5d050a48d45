/**
 * Entry point: `npx tsx fakes/payments/src/server.ts` with the PAYMENTS_* variables set
 * (see ../README.md). Stops cleanly on SIGINT/SIGTERM.
 */
import { API_VERSION, createPaymentsFake } from './app';
import { ConfigError, configFromEnv } from './config';

async function main(): Promise<void> {
  const config = configFromEnv();
  const fake = createPaymentsFake(config);
  const url = await fake.listen();
  const publicUrl = config.publicUrl ?? url;
  console.log(
    [
      `Payments stand-in listening on ${url} (API version ${API_VERSION})`,
      `  API:            ${url}/v1 (SDK: host ${config.host}, port ${fake.port}, protocol http)`,
      `  Checkout pages: ${publicUrl}/pay/<session id>`,
      `  Webhooks to:    ${config.webhookUrl}`,
      `  State:          ${config.stateFile ?? 'in memory (PAYMENTS_STATE_FILE not set)'}`,
    ].join('\n'),
  );
  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    await fake.close();
    process.exit(0);
  };
  process.once('SIGINT', () => void stop());
  process.once('SIGTERM', () => void stop());
}

main().catch((error: unknown) => {
  if (error instanceof ConfigError) console.error(error.message);
  else if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
    console.error(
      `The payments stand-in cannot start: the port is already in use (${(error as Error).message}). Set PAYMENTS_PORT to a free port.`,
    );
  } else console.error(error);
  process.exit(1);
});
