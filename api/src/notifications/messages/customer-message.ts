import escapeHtml from 'escape-html';
import { DateTime } from 'luxon';
import type { MailAttachment, MailContent } from '../../mail/templates/mail-content';
import { formatCents } from '../../pricing/cents';

/** What every customer message builder returns. */
export interface CustomerMessage extends MailContent {
  attachments: MailAttachment[];
}

/** The workshop's card, as every message shows it. */
export interface WorkshopCard {
  name: string;
  addressLine: string;
  town: string;
  phone: string;
  email: string;
}

/** "Thursday 3 December 2026, 7:30 am AEDT" in the workshop's zone. */
export function workshopDateTime(instant: Date, timeZone: string): string {
  return DateTime.fromJSDate(instant, { zone: timeZone })
    .setLocale('en-AU')
    .toFormat('cccc d LLLL yyyy, h:mm a ZZZZ');
}

/** "1,234.50 AUD". */
export function amount(cents: number, currency: string): string {
  return `${formatCents(cents)} ${currency.toUpperCase()}`;
}

export function cardLines(workshop: WorkshopCard): string[] {
  return [
    workshop.name,
    workshop.addressLine,
    workshop.town,
    `Phone ${workshop.phone}`,
    workshop.email,
  ];
}

/**
 * One message in the house layout: a greeting, paragraphs, a table of facts, closing
 * paragraphs and the workshop's card, as plain text and as HTML (every value escaped).
 */
export function layoutMessage(input: {
  subject: string;
  customerName: string;
  lead: string[];
  facts: [string, string][];
  closing: string[];
  workshop: WorkshopCard;
  attachments?: MailAttachment[];
}): CustomerMessage {
  const card = cardLines(input.workshop);
  const width = Math.max(0, ...input.facts.map(([label]) => label.length));
  const text = [
    `Hello ${input.customerName},`,
    '',
    ...input.lead.flatMap((paragraph) => [paragraph, '']),
    ...input.facts.map(([label, value]) => `${`${label}:`.padEnd(width + 2)}${value}`),
    ...(input.facts.length > 0 ? [''] : []),
    ...input.closing.flatMap((paragraph) => [paragraph, '']),
    ...card,
  ].join('\n');
  const rows = input.facts
    .map(
      ([label, value]) =>
        `<tr><th align="left" style="padding: 2px 12px 2px 0;">${escapeHtml(label)}</th><td>${escapeHtml(value)}</td></tr>`,
    )
    .join('\n        ');
  // A paragraph that is only a web address becomes a link in the HTML part.
  const paragraphs = (list: string[]) =>
    list
      .map((paragraph) =>
        /^https?:\/\/\S+$/.test(paragraph)
          ? `<p><a href="${escapeHtml(paragraph)}">${escapeHtml(paragraph)}</a></p>`
          : `<p>${escapeHtml(paragraph)}</p>`,
      )
      .join('\n    ');
  const html = `<!doctype html>
<html lang="en">
  <body style="font-family: sans-serif; line-height: 1.5; color: #1f2328;">
    <p>Hello ${escapeHtml(input.customerName)},</p>
    ${paragraphs(input.lead)}
    <table style="border-collapse: collapse;">
        ${rows}
    </table>
    ${paragraphs(input.closing)}
    <p>${card.map((line) => escapeHtml(line)).join('<br>')}</p>
  </body>
</html>`;
  return { subject: input.subject, text, html, attachments: input.attachments ?? [] };
}
