/** What every message template returns: a subject, a plain-text part and an HTML part. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

/** A file sent with a message (an iCalendar event, a PDF), as text or bytes. */
export interface MailAttachment {
  filename: string;
  /** The full MIME type, with its parameters (e.g. `text/calendar; charset=utf-8; method=REQUEST`). */
  contentType: string;
  /** Text content (an iCalendar object), or base64 of binary content (a PDF). */
  content: string;
  /** `base64` when `content` is base64 of bytes; absent for text. */
  encoding?: 'base64';
}

/** A customer message as the outbox keeps it: the content, its attachments and its envelope. */
export interface OutgoingMail extends MailContent {
  to: string;
  replyTo?: string;
  /** `<msg-<job id>@<workshop mail domain>>`: the same on every try of one job. */
  messageId: string;
  attachments: MailAttachment[];
}
