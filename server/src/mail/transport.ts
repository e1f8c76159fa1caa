import nodemailer from 'nodemailer';
import QRCode from 'qrcode';
import type { Env } from '../config/env';

export interface OutgoingMail {
  to: string;
  subject: string;
  html: string;
  text: string;
  attachments?: MailAttachment[];
  /** The same for every attempt at one mail, so a receiver can tell a resend from a new mail. */
  messageId?: string;
}

/** An attachment is stored as bytes, or as the text of a QR code drawn when the mail is sent (off the request path). */
export type MailAttachment = { filename: string; cid?: string; contentType: string } & (
  { base64: string } | { qrText: string }
);

export interface MailSender {
  send(mail: OutgoingMail): Promise<void>;
}

/** The one real sender: SMTP through nodemailer. In development the SMTP server is the local mailbox. */
export function smtpSender(
  env: Pick<Env, 'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASSWORD' | 'MAIL_FROM'>,
): MailSender {
  const local = ['127.0.0.1', 'localhost', '::1'].includes(env.SMTP_HOST);
  const transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    ignoreTLS: local && !env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10000,
  });
  return {
    async send(mail) {
      await transport.sendMail({
        from: env.MAIL_FROM,
        messageId: mail.messageId,
        to: mail.to,
        subject: mail.subject,
        html: mail.html,
        text: mail.text,
        attachments: await Promise.all(
          (mail.attachments ?? []).map(async (a) => ({
            filename: a.filename,
            cid: a.cid,
            contentType: a.contentType,
            content:
              'qrText' in a
                ? await QRCode.toBuffer(a.qrText, { errorCorrectionLevel: 'M', margin: 2, width: 240 })
                : Buffer.from(a.base64, 'base64'),
          })),
        ),
      });
    },
  };
}
