import 'reflect-metadata';
import { AppConfigService } from './config/app-config.service';
import { validateEnvironment } from './config/environment';
import { createApp } from './create-app';

function exitWith(message: string): never {
  process.stderr.write(`Liftwright API did not start. ${message}\n`);
  process.exit(1);
}

async function bootstrap(): Promise<void> {
  const app = await createApp();
  const config = app.get(AppConfigService);
  await app.listen(config.port, config.host);
}

// The same validation ConfigModule runs, done first so that a bad variable ends start-up with
// one clear line that names it (ConfigModule would also refuse to start, with a stack trace).
try {
  validateEnvironment(process.env);
} catch (error) {
  exitWith(error instanceof Error ? error.message : String(error));
}

bootstrap().catch((error: unknown) => {
  exitWith(error instanceof Error ? (error.stack ?? error.message) : String(error));
});
