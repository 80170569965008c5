// Ids that stand for a person's sign-in (sessions, challenges): random in the browser, hashed in the database,
// so that a copy of the database signs nobody in.
import { createHash, randomBytes } from "node:crypto";

/** 256 random bits, URL-safe: what a cookie carries. */
export function newRandomId(): string {
  return randomBytes(32).toString("base64url");
}

export function hashRandomId(id: string): string {
  return createHash("sha256").update(id).digest("hex");
}
