import { type DynamicModule, Global, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { AppConfigService } from './app-config.service';
import { validateEnvironment } from './environment';

@Global()
@Module({
  providers: [AppConfigService],
  exports: [AppConfigService],
})
export class AppConfigModule {
  /**
   * ConfigModule.forRoot() validates the environment as soon as it is called. It is called here,
   * when the application is built, not when a file is imported: a bad variable then rejects
   * NestFactory.create() (and start-up stops) instead of failing at import time.
   */
  static forRoot(): DynamicModule {
    return {
      module: AppConfigModule,
      imports: [ConfigModule.forRoot({ validate: validateEnvironment, cache: true })],
    };
  }
}
