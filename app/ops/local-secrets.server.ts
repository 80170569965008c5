import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";

export interface LocalSecrets {
  SESSION_SECRET: string;
  TOTP_SECRET: string;
}

/** Secrets for a local installation, made once and kept in an ignored file, so sessions survive restarts. */
export function loadOrCreateLocalSecrets(root: string): LocalSecrets {
  const file = path.join(root, ".cache", "local-secrets.json");
  if (existsSync(file)) return JSON.parse(readFileSync(file, "utf8")) as LocalSecrets;
  const secrets: LocalSecrets = {
    SESSION_SECRET: randomBytes(32).toString("hex"),
    TOTP_SECRET: randomBytes(32).toString("hex"),
  };
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
