import { Inject, Injectable, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, Transporter } from 'nodemailer';
import { AppConfig } from '../../config/app-config';
import { MailService, SmtpRefusal, type OutgoingMail, type SmtpAcceptance } from './mail.service';

/**
 * The mail port on SMTP: the only place that speaks it, through one pooled connection set per process (bounded by the
 * relay's concurrency). Domain code writes mail to the outbox; the outbox relay calls send().
 */
@Injectable()
export class SmtpMailService extends MailService implements OnModuleDestroy {
  private readonly transporter: Transporter;
  private readonly from: string;
  /** The host part of Message-IDs (the sender's domain), so they look like the sender's own. */
  readonly messageIdDomain: string;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    super();
    const mail = config.get('mail', { infer: true });
    this.from = mail.from;
    this.messageIdDomain = /@([^>\s]+)/.exec(mail.from)?.[1] ?? 'fitwright.local';
    this.transporter = createTransport({
      pool: true,
      maxConnections: mail.relay.concurrency,
      maxMessages: 500,
      host: mail.host,
      port: mail.port,
      secure: mail.secure,
      ignoreTLS: mail.ignoreTls,
      auth: mail.user ? { user: mail.user, pass: mail.password } : undefined,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 20_000,
    });
  }

  /** Connects, greets and (when configured) authenticates, without sending anything. */
  async ping(): Promise<void> {
    await this.transporter.verify();
  }

  /**
   * Sends one message with the given Message-ID (derived from its idempotency key, so a repeat after a
   * crash carries the same id and a receiving system can drop it). Resolves only once the server accepted.
   */
  async send(mail: OutgoingMail, messageId: string): Promise<SmtpAcceptance> {
    try {
      const info = (await this.transporter.sendMail({ from: this.from, ...mail, messageId })) as { response?: string; rejected?: unknown[] };
      if (Array.isArray(info.rejected) && info.rejected.length > 0) throw new SmtpRefusal(`recipient refused: ${info.response ?? ''}`, 550, true);
      return { reply: String(info.response ?? 'accepted').slice(0, 500) };
    } catch (error) {
      if (error instanceof SmtpRefusal) throw error;
      const code = (error as { responseCode?: unknown }).responseCode;
      const responseCode = typeof code === 'number' ? code : undefined;
      const message = error instanceof Error ? error.message : String(error);
      throw new SmtpRefusal(message.slice(0, 500), responseCode, responseCode !== undefined && responseCode >= 500 && responseCode < 600);
    }
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
