import { createCookieSessionStorage } from "react-router";
import { cookieIsSecure, env } from "./env.server.ts";

export interface SessionData {
  userId: string;
}

export interface SessionFlash {
  notice: string;
}

let storage: ReturnType<typeof createStorage> | undefined;

function createStorage() {
  return createCookieSessionStorage<SessionData, SessionFlash>({
    cookie: {
      name: "__betasift",
      httpOnly: true,
      sameSite: "lax",
      path: "/",
      secure: cookieIsSecure(),
      secrets: [env().SESSION_SECRET],
      maxAge: 60 * 60 * 24 * 14,
    },
  });
}

export function sessionStorage() {
  storage ??= createStorage();
  return storage;
}

export function getSession(request: Request) {
  return sessionStorage().getSession(request.headers.get("Cookie"));
}
