import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { NotificationsModule } from '../notifications/notifications.module';
import { Payment } from './entities/payment.entity';
import { ProcessedWebhookEvent } from './entities/processed-webhook-event.entity';
import { Refund } from './entities/refund.entity';
import { PaymentWebhooksService } from './payment-webhooks.service';
import { PAYMENTS_CLIENT, paymentsClientProvider } from './payments-client';
import { PaymentsController } from './payments.controller';
import { PaymentsService } from './payments.service';

/**
 * Deposits through the payment provider's API: the SDK client (PAYMENTS_CLIENT, configured
 * only by PAYMENTS_SECRET_KEY and PAYMENTS_API_URL), checkout sessions and refunds for the
 * booking service, and the provider's webhook.
 */
@Module({
  imports: [
    MikroOrmModule.forFeature([Payment, Refund, ProcessedWebhookEvent]),
    NotificationsModule,
  ],
  controllers: [PaymentsController],
  providers: [paymentsClientProvider, PaymentsService, PaymentWebhooksService],
  exports: [PAYMENTS_CLIENT, PaymentsService],
})
export class PaymentsModule {}
