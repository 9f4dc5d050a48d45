import { inboxUrl } from './env';

/** A message as the local e-mail catcher's REST API returns it (fields the tests read). */
export interface CaughtMessage {
  id: string;
  subject: string;
  text?: string;
  html?: string;
  to: { address: string; name?: string }[];
  date: string;
}

export async function listMessages(): Promise<CaughtMessage[]> {
  const response = await fetch(`${inboxUrl}/email`);
  if (!response.ok) throw new Error(`The inbox answered ${response.status}`);
  return (await response.json()) as CaughtMessage[];
}

/** Waits until a message to `address` whose subject matches arrives; returns the newest such. */
export async function waitForMessage(
  address: string,
  subject: RegExp,
  timeoutMs = 15_000,
): Promise<CaughtMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await listMessages())
      .filter(
        (m) =>
          m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()) &&
          subject.test(m.subject),
      )
      .sort((a, b) => Date.parse(b.date) - Date.parse(a.date));
    if (found.length > 0) return found[0];
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`No message to ${address} matching ${subject} within ${timeoutMs} ms`);
}
