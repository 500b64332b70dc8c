import { MailDev } from 'maildev';
import { assertPortFree } from './process.ts';

export interface FakeSmtpOptions {
  host: string;
  smtpPort: number;
  inboxPort: number;
}

/** A local SMTP server (MailDev) with a web inbox and the HTTP API the tests read mail through. */
export async function startFakeSmtp(options: FakeSmtpOptions): Promise<{ stop(): Promise<void> }> {
  await assertPortFree(options.host, options.smtpPort, 'SMTP_PORT');
  await assertPortFree(options.host, options.inboxPort, 'MAIL_INBOX_PORT');
  const maildev = new MailDev({
    smtp: options.smtpPort,
    ip: options.host,
    web: options.inboxPort,
    webIp: options.host,
    silent: true,
  });
  await maildev.start();
  return { stop: () => maildev.stop() };
}
