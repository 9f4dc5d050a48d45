function required(name: string): string {
  const value = process.env[name];
  if (!value) {
    throw new Error(
      `${name} is not set: run the end-to-end tests through \`npm test\`, which starts the stack.`,
    );
  }
  return value;
}

export const baseUrl = required('E2E_BASE_URL').replace(/\/$/, '');
export const inboxUrl = (process.env.E2E_INBOX_URL ?? '').replace(/\/$/, '');
/**
 * The payments stand-in's own origin (its hosted checkout page), when the stack names it;
 * without it a journey only checks that the checkout page is on another origin.
 */
export const paymentsUrl = (process.env.E2E_PAYMENTS_URL ?? '').replace(/\/$/, '');
export const artifactsDir = new URL('../artifacts/', import.meta.url).pathname;

/** The demo accounts loaded by the seeder (fictional). */
export const demoUsers = {
  customer: { email: 'customer@liftwright.example', password: 'customer-demo-1' },
  desk: { email: 'desk@liftwright.example', password: 'desk-demo-1' },
  tech: { email: 'tech@liftwright.example', password: 'tech-demo-1' },
  manager: { email: 'manager@liftwright.example', password: 'manager-demo-1' },
} as const;
