import { Controller, Headers, HttpCode, HttpStatus, Post, Req } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiHeader,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { SignedByProvider } from '../common/decorators/signed-by-provider.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { WebhookReceivedResponse } from './dto/payment.response';
import { PaymentWebhooksService, SIGNATURE_HEADER } from './payment-webhooks.service';

/** A request whose exact body bytes the body parser kept (only on the webhook path). */
export type RawBodyRequest = Request & { rawBody?: Buffer };

@ApiTags('payments')
@Controller('payments')
export class PaymentsController {
  constructor(private readonly webhooks: PaymentWebhooksService) {}

  @Public()
  @SignedByProvider()
  @Post('webhook')
  @HttpCode(HttpStatus.OK)
  @ApiOperation({
    summary:
      "The payment provider's events (server to server: no session or CSRF token; verified by the signature over the raw body, at most 300 s old). Each event id is handled once; a repeat answers 200 and changes nothing.",
  })
  @ApiHeader({ name: SIGNATURE_HEADER, required: true, description: 't=<unix time>,v1=<HMAC>' })
  @ApiOkResponse({ type: WebhookReceivedResponse })
  @ApiBadRequestResponse({
    description: 'Missing, stale or non-matching signature: nothing recorded',
    type: ErrorResponse,
  })
  async receive(
    @Req() request: RawBodyRequest,
    @Headers(SIGNATURE_HEADER) signature: string | undefined,
  ): Promise<WebhookReceivedResponse> {
    const event = this.webhooks.verify(request.rawBody, signature);
    return this.webhooks.handle(event);
  }
}
