/** What every message template returns: a subject, a plain-text part and an HTML part. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}
