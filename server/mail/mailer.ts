import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html: string;
  /** A fixed Message-ID ("<id@host>"), so a resent message is recognisably the same one; nodemailer makes one otherwise. */
  messageId?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  close(): void;
}

/** All mail leaves through nodemailer: a real provider with SMTP_URL, the loopback capture server otherwise. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport: Transporter = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      const info = await transport.sendMail({ from, ...mail });
      return { messageId: info.messageId };
    },
    close: () => transport.close(),
  };
}
