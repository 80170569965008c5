import nodemailer, { type Transporter } from "nodemailer";
import { env } from "./env.server.ts";

let transporter: Transporter | undefined;

function mailer(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env().SMTP_HOST,
    port: env().SMTP_PORT,
    secure: false,
    // The catcher runs on loopback without TLS.
    ignoreTLS: true,
  });
  return transporter;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await mailer().sendMail({ from: env().MAIL_FROM, ...mail });
}

export async function mailAnswers(): Promise<boolean> {
  try {
    await mailer().verify();
    return true;
  } catch {
    return false;
  }
}
