export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  headers?: Record<string, string>;
}

/** What the mail server answered to a message it took. */
export interface SmtpAcceptance {
  reply: string;
}

/** The server refused the message: `permanent` for a 5xx answer (the address or the message is refused). */
export class SmtpRefusal extends Error {
  constructor(
    message: string,
    readonly responseCode: number | undefined,
    readonly permanent: boolean,
  ) {
    super(message);
  }
}

/**
 * The mail port: the outbox relay sends through it; domain code never does (it writes to the outbox). It is
 * also the injection token: `InfraModule` binds the driver `MAIL_DRIVER` names (`smtp`: `SmtpMailService`),
 * so a hosted provider's driver replaces it by configuration.
 */
export abstract class MailService {
  /** The host part of Message-IDs (the sender's domain), so they look like the sender's own. */
  abstract readonly messageIdDomain: string;

  /** Reaches the server (connects, greets, authenticates) without sending anything. */
  abstract ping(): Promise<void>;

  /**
   * Sends one message with the given Message-ID (derived from its idempotency key, so a repeat after a
   * crash carries the same id). Resolves only once the server accepted; throws `SmtpRefusal` otherwise.
   */
  abstract send(mail: OutgoingMail, messageId: string): Promise<SmtpAcceptance>;
}
