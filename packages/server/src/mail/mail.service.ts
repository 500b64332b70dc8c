import { Injectable, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, type Transporter } from 'nodemailer';
import type { Environment } from '../config/environment';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** How long SMTP may stay silent at each step before the send fails. */
export const SMTP_TIMEOUT_MS = 5_000;

/** Sends e-mail through SMTP with nodemailer: the local fake inbox, or a real relay by configuration. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly transporter: Transporter;
  private readonly from: string;

  constructor(config: ConfigService<Environment, true>) {
    const user = config.get('SMTP_USER', { infer: true });
    const pass = config.get('SMTP_PASSWORD', { infer: true });
    this.from = config.get('MAIL_FROM', { infer: true });
    this.transporter = createTransport({
      host: config.get('SMTP_HOST', { infer: true }),
      port: config.get('SMTP_PORT', { infer: true }),
      secure: config.get('SMTP_SECURE', { infer: true }),
      ...(user ? { auth: { user, pass } } : {}),
      // A relay that accepts and then says nothing must not hold a request for nodemailer's
      // defaults (2 minutes to connect, 10 minutes of silence): mail is sent inside requests.
      connectionTimeout: SMTP_TIMEOUT_MS,
      greetingTimeout: SMTP_TIMEOUT_MS,
      socketTimeout: SMTP_TIMEOUT_MS,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transporter.sendMail({ from: this.from, ...mail });
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
