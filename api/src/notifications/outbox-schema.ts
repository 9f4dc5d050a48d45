/** The PostgreSQL schema pg-boss creates and migrates for itself (never by our migrations). */
export const OUTBOX_SCHEMA = 'pgboss';

/** The one queue of customer e-mail. */
export const CUSTOMER_MAIL_QUEUE = 'customer-mail';
