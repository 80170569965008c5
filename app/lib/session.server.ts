// Sessions live in PostgreSQL (design 2): the cookie carries only a signed random id, so sign-out,
// deactivation and "sign out everywhere" end a session at once, on every app instance.
import { createCookie, createSessionStorage } from "react-router";
import { createSessionRow, deleteSessionRow, readSessionRow, updateSessionRow } from "#app/data/sessions.server.ts";
import { cookieIsSecure, env } from "./env.server.ts";
import { readStrictCookie } from "./strict-cookie.server.ts";

export interface SessionData {
  userId: string;
}

export interface SessionFlash {
  notice: string;
}

export const SESSION_LIFETIME_SECONDS = 60 * 60 * 24 * 14;
const SESSION_COOKIE_NAME = "__betasift";

let cookie: ReturnType<typeof createCookie> | undefined;
let storage: ReturnType<typeof createStorage> | undefined;

function sessionCookie() {
  cookie ??= createCookie(SESSION_COOKIE_NAME, {
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: cookieIsSecure(),
    secrets: [env().SESSION_SECRET],
    maxAge: SESSION_LIFETIME_SECONDS,
  });
  return cookie;
}

function expiryOrDefault(expires: Date | undefined): Date {
  return expires ?? new Date(Date.now() + SESSION_LIFETIME_SECONDS * 1000);
}

function createStorage() {
  return createSessionStorage<SessionData, SessionFlash>({
    cookie: sessionCookie(),
    createData: (data, expires) => createSessionRow(data, expiryOrDefault(expires)),
    readData: (id) => readSessionRow(id),
    updateData: (id, data, expires) => updateSessionRow(id, data, expiryOrDefault(expires)),
    deleteData: (id) => deleteSessionRow(id),
  });
}

export function sessionStorage() {
  storage ??= createStorage();
  return storage;
}

export function getSession(request: Request) {
  return sessionStorage().getSession(request.headers.get("Cookie"));
}

/** The session id from the signed cookie, or null when absent, tampered with or spelled unlike our own. */
export function readSessionId(request: Request): Promise<string | null> {
  return readStrictCookie(sessionCookie(), request);
}
