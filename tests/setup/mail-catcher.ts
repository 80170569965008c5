import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
  receivedAt: number;
}

/** An in-process SMTP catcher on loopback; each message lands as a JSON file that tests read. */
export async function startMailCatcher(directory: string): Promise<{ port: number; stop: () => Promise<void> }> {
  mkdirSync(directory, { recursive: true });
  let counter = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = (Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : []).flatMap((a) => a.value.map((v) => (v.address ?? "").toLowerCase()));
          const mail: CaughtMail = { to, subject: parsed.subject ?? "", text: parsed.text ?? "", receivedAt: Date.now() };
          counter += 1;
          writeFileSync(path.join(directory, `${Date.now()}-${process.pid}-${counter}.json`), JSON.stringify(mail));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  const port = await new Promise<number>((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve((server.server.address() as { port: number }).port));
  });
  return { port, stop: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

export function readMails(directory: string): CaughtMail[] {
  return readdirSync(directory)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(directory, f), "utf8")) as CaughtMail);
}

/** Waits for a mail to `to` that arrived after `since` (ms epoch). */
export async function waitForMail(directory: string, to: string, since: number, timeoutMs = 30_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = readMails(directory).filter((m) => m.to.includes(to.toLowerCase()) && m.receivedAt >= since).at(-1);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no e-mail to ${to} within ${timeoutMs} ms`);
}

export function signInCodeFrom(mail: CaughtMail): string {
  const match = /sign-in code is: (\d{6})/.exec(mail.text);
  if (!match) throw new Error(`no sign-in code in: ${mail.text}`);
  return match[1]!;
}

export function magicLinkFrom(mail: CaughtMail): string {
  const match = /(https?:\/\/\S+\/sign-in\/link\?\S+)/.exec(mail.text);
  if (!match) throw new Error(`no sign-in link in: ${mail.text}`);
  return match[1]!;
}
