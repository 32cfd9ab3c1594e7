import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, Transporter } from 'nodemailer';
import { AppConfig } from '../../config/app-config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  headers?: Record<string, string>;
}

/** The only place that speaks SMTP. Domain code enqueues mail jobs; the mail processor calls send(). */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transporter: Transporter;
  private readonly from: string;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    const mail = config.get('mail', { infer: true });
    this.from = mail.from;
    this.transporter = createTransport({
      host: mail.host,
      port: mail.port,
      secure: mail.secure,
      ignoreTLS: mail.ignoreTls,
      auth: mail.user ? { user: mail.user, pass: mail.password } : undefined,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
    });
  }

  /** Connects, greets and (when configured) authenticates, without sending anything. */
  async ping(): Promise<void> {
    await this.transporter.verify();
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transporter.sendMail({ from: this.from, ...mail });
    this.logger.log(`sent "${mail.subject}"`);
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
