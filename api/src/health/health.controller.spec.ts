import { ServiceUnavailableException } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { MikroOrmHealthIndicator, TerminusModule } from '@nestjs/terminus';
import { describe, expect, it } from 'vitest';
import { HealthController } from './health.controller';

async function controllerWithDatabase(up: boolean): Promise<HealthController> {
  const moduleRef = await Test.createTestingModule({
    imports: [TerminusModule.forRoot({ logger: false })],
    controllers: [HealthController],
  })
    .overrideProvider(MikroOrmHealthIndicator)
    .useValue({
      // The shape MikroOrmHealthIndicator.pingCheck resolves to.
      pingCheck: async (key: string) => ({
        [key]: up ? { status: 'up' } : { status: 'down', message: 'connect ECONNREFUSED' },
      }),
    })
    .compile();
  return moduleRef.get(HealthController);
}

describe('HealthController', () => {
  it('is ready when the database answers', async () => {
    const controller = await controllerWithDatabase(true);
    await expect(controller.ready()).resolves.toMatchObject({ status: 'ok' });
  });

  it('answers 503 when the database does not', async () => {
    const controller = await controllerWithDatabase(false);
    await expect(controller.ready()).rejects.toBeInstanceOf(ServiceUnavailableException);
  });

  it('is live without the database', async () => {
    const controller = await controllerWithDatabase(false);
    await expect(controller.live()).resolves.toMatchObject({ status: 'ok' });
  });
});
