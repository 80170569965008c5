// Every absolute link Betasift writes (e-mails, reports) starts from the configured public origin,
// never from a request's Host header, which anyone can forge.
import { env } from "./env.server.ts";

export function publicOrigin(): string {
  return env().PUBLIC_ORIGIN;
}

/** An absolute link to a path of this installation. */
export function publicUrl(pathAndQuery: string): string {
  return new URL(pathAndQuery, `${publicOrigin()}/`).toString();
}
