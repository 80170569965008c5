// Cross-site request forgery: a state-changing request must come from a page of this installation, as its
// Origin header says (browsers send it on every non-GET request and pages cannot forge it). Requests that
// authenticate with a bearer token carry no ambient cookie and are exempt.
import type { NextFunction, Request, Response } from "express";
import { env } from "#app/lib/env.server.ts";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export function carriesBearerToken(authorization: string | undefined): boolean {
  return typeof authorization === "string" && /^Bearer\s+\S+/i.test(authorization);
}

/** Why a request's origin is refused, or null when it may go on. */
export function foreignOriginProblem(method: string, origin: string | undefined, authorization: string | undefined): string | null {
  if (SAFE_METHODS.has(method.toUpperCase()) || carriesBearerToken(authorization)) return null;
  const expected = env().PUBLIC_ORIGIN;
  if (origin === expected) return null;
  if (!origin || origin === "null") {
    return `This request did not say which page sent it, so Betasift refused it. Send it from ${expected}, or from a script with an API token.`;
  }
  return `This request came from ${origin}, not from Betasift at ${expected}, so Betasift refused it. Open Betasift at ${expected} and try again.`;
}

export function refuseForeignOrigin(req: Request, res: Response, next: NextFunction): void {
  const problem = foreignOriginProblem(req.method, req.get("origin"), req.get("authorization"));
  if (!problem) return next();
  res.status(403).set("Cache-Control", "no-store");
  if (req.path.startsWith("/api/")) {
    res.json({ error: { code: "foreign-origin", message: problem, details: { origin: req.get("origin") ?? null } } });
  } else {
    res.type("text/plain").send(problem);
  }
}

const LOOPBACK_HOSTS = new Set(["localhost", "127.0.0.1", "[::1]"]);

/**
 * A person who opens the demo as http://localhost:3000 while it is configured as http://127.0.0.1:3000 would have
 * every form refused; pages read that way are sent to the configured origin instead. Only loopback names are
 * redirected, so a proxy in front of a real installation is never second-guessed.
 */
export function redirectLoopbackAlias(req: Request, res: Response, next: NextFunction): void {
  if (req.method !== "GET" && req.method !== "HEAD") return next();
  const configured = new URL(env().PUBLIC_ORIGIN);
  const asked = req.get("host") ?? "";
  const askedName = asked.replace(/:\d+$/, "");
  if (!LOOPBACK_HOSTS.has(configured.hostname) || !LOOPBACK_HOSTS.has(askedName) || asked === configured.host) return next();
  res.redirect(302, new URL(req.originalUrl, configured).toString());
}
