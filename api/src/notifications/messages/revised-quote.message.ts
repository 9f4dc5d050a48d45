import { longDate } from '../../workshop/workshop-time';
import type { MailAttachment } from '../../mail/templates/mail-content';
import { type CustomerMessage, type WorkshopCard, amount, layoutMessage } from './customer-message';

export interface RevisedQuoteInput {
  customer: { name: string; email: string };
  workshop: WorkshopCard;
  /** "Q-000123". */
  quoteReference: string;
  versionNumber: number;
  previousVersionNumber: number;
  vehicleName: string;
  currency: string;
  reason: string;
  totalCents: number;
  previousTotalCents: number;
  depositCents: number;
  previousDepositCents: number;
  /** The local date the price holds to, YYYY-MM-DD. */
  validUntilDate: string;
  /** The page that shows both versions and takes the answer. */
  compareUrl: string;
  /** A booking that waits on the answer, in words ("B-000042 on Thursday 3 December…"), if any. */
  bookingLine: string | null;
  pdf: { fileName: string; bytes: Buffer };
}

function change(now: number, before: number, currency: string): string {
  if (now === before) return `${amount(now, currency)} (unchanged)`;
  return `${amount(now, currency)} (was ${amount(before, currency)})`;
}

/**
 * The desk revised the customer's quote: why, the new totals beside the old, the new version as
 * a PDF and the link to compare and answer.
 */
export function revisedQuoteMessage(input: RevisedQuoteInput): CustomerMessage {
  const reference = `${input.quoteReference} v${input.versionNumber}`;
  const pdf: MailAttachment = {
    filename: input.pdf.fileName,
    contentType: 'application/pdf',
    content: input.pdf.bytes.toString('base64'),
    encoding: 'base64',
  };
  return layoutMessage({
    subject: `Revised quote ${reference} from ${input.workshop.name}`,
    customerName: input.customer.name,
    lead: [
      `We have revised your quote for the ${input.vehicleName}. Version ${input.versionNumber} replaces version ${input.previousVersionNumber}; the new version is attached as a PDF.`,
      `Why: ${input.reason}`,
      'Compare the two versions and accept or decline the new one here (sign in with this e-mail address):',
      input.compareUrl,
    ],
    facts: [
      ['Quote', reference],
      ['Vehicle', input.vehicleName],
      ['New total', change(input.totalCents, input.previousTotalCents, input.currency)],
      ['Deposit', change(input.depositCents, input.previousDepositCents, input.currency)],
      ['Price valid until', longDate(input.validUntilDate)],
      ...(input.bookingLine ? ([['Booking', input.bookingLine]] as [string, string][]) : []),
    ],
    closing: [
      ...(input.bookingLine
        ? [
            'Your booking stays as it is until you answer. If you accept and the work takes longer, we re-plan it or call you to find a new time.',
          ]
        : []),
      'Fitment is checked again by a licensed technician before any work; local vehicle codes apply.',
    ],
    workshop: input.workshop,
    attachments: [pdf],
  });
}
