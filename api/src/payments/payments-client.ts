import type { Provider } from '@nestjs/common';
import Stripe from 'stripe';
import { AppConfigService } from '../config/app-config.service';

/** Injection token of the payment provider's SDK client (one per process). */
export const PAYMENTS_CLIENT = 'PAYMENTS_CLIENT';

/** The SDK client the payment code talks to the provider with. */
export type PaymentsClient = Stripe;

/** How long one call to the provider may take, and how often the SDK tries again on its own. */
const TIMEOUT_MS = 10_000;
const MAX_NETWORK_RETRIES = 2;

export interface ProviderAddress {
  host: string;
  port: number;
  protocol: 'http' | 'https';
}

/** host, port and protocol of PAYMENTS_API_URL, as the SDK takes them. */
export function providerAddressOf(apiUrl: string): ProviderAddress {
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'http:' ? 'http' : 'https';
  return {
    host: url.hostname,
    port: url.port === '' ? (protocol === 'http' ? 80 : 443) : Number(url.port),
    protocol,
  };
}

/** The provider's SDK with the secret key; at PAYMENTS_API_URL when that is set. */
export function createPaymentsClient(secretKey: string, apiUrl?: string): PaymentsClient {
  return new Stripe(secretKey, {
    ...(apiUrl ? providerAddressOf(apiUrl) : {}),
    maxNetworkRetries: MAX_NETWORK_RETRIES,
    timeout: TIMEOUT_MS,
  });
}

export const paymentsClientProvider: Provider = {
  provide: PAYMENTS_CLIENT,
  inject: [AppConfigService],
  useFactory: (config: AppConfigService): PaymentsClient =>
    createPaymentsClient(config.paymentsSecretKey, config.paymentsApiUrl),
};
