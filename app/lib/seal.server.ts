// Seals small secrets (a sign-in code on its way to the mailer) before they rest in the job table:
// AES-256-GCM under a key derived from the session secret, so a copy of the database reads none of them.
import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from "node:crypto";
import { env } from "./env.server.ts";

let key: Buffer | undefined;

function sealKey(): Buffer {
  key ??= Buffer.from(hkdfSync("sha256", env().SESSION_SECRET, "betasift", "sealed job payload v1", 32));
  return key;
}

export function seal(value: unknown): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", sealKey(), iv);
  const body = Buffer.concat([cipher.update(JSON.stringify(value), "utf8"), cipher.final()]);
  return [iv, cipher.getAuthTag(), body].map((part) => part.toString("base64url")).join(".");
}

/** The sealed value, or null when it was not sealed with this installation's secret or was altered. */
export function unseal(sealed: string): unknown {
  const [iv, tag, body] = sealed.split(".").map((part) => Buffer.from(part, "base64url"));
  if (!iv || !tag || !body || iv.length !== 12 || tag.length !== 16) return null;
  try {
    const decipher = createDecipheriv("aes-256-gcm", sealKey(), iv);
    decipher.setAuthTag(tag);
    return JSON.parse(Buffer.concat([decipher.update(body), decipher.final()]).toString("utf8"));
  } catch {
    return null;
  }
}
