// Who is signed in, and what they may do. Every loader, action and API route starts here.
import { redirect } from "react-router";
import { deleteSessionsOf, findSessionPerson } from "#app/data/sessions.server.ts";
import { recordSignIn, type Person } from "#app/data/users.server.ts";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "./db.server.ts";
import { hasRole, type Role } from "./roles.ts";
import { getSession, readSessionId, sessionStorage } from "./session.server.ts";
import { SIGN_IN_PATH } from "./sign-in.server.ts";

function wantsJson(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}

/** The answer while the database is out of reach: a 503 page, or the API's JSON error. */
export function databaseUnavailableResponse(request: Request): Response {
  const headers = { "Retry-After": "30", "Cache-Control": "no-store" };
  if (wantsJson(request)) {
    return Response.json({ error: { code: "database-unavailable", message: DATABASE_UNAVAILABLE_MESSAGE, details: null } }, { status: 503, headers });
  }
  return new Response(DATABASE_UNAVAILABLE_MESSAGE, { status: 503, statusText: "Service Unavailable", headers });
}

// The root loader and a page's own loader both ask within one request; it is answered once.
const askedThisRequest = new WeakMap<Request, Promise<Person | null>>();

// A request that names a bearer token is judged by the token alone, never by a cookie riding along: the
// origin check lets such requests through. (No token is valid until API tokens exist.)
function carriesBearerToken(request: Request): boolean {
  return /^Bearer\s+\S+/i.test(request.headers.get("Authorization") ?? "");
}

async function lookUpUser(request: Request): Promise<Person | null> {
  if (carriesBearerToken(request)) return null;
  const sessionId = await readSessionId(request);
  if (!sessionId) return null;
  try {
    return await findSessionPerson(sessionId);
  } catch (error) {
    if (isDatabaseUnavailable(error)) throw databaseUnavailableResponse(request);
    throw error;
  }
}

/** The signed-in person, or null. An ended session or a deactivated person counts as signed out at once. */
export function getOptionalUser(request: Request): Promise<Person | null> {
  let asked = askedThisRequest.get(request);
  if (!asked) {
    asked = lookUpUser(request);
    askedThisRequest.set(request, asked);
  }
  return asked;
}

export async function requireUser(request: Request): Promise<Person> {
  const person = await getOptionalUser(request);
  if (person) return person;
  if (wantsJson(request)) {
    throw Response.json({ error: { code: "unauthenticated", message: "Sign in first.", details: null } }, { status: 401 });
  }
  const url = new URL(request.url);
  const redirectTo = url.pathname === "/" ? "" : `?redirectTo=${encodeURIComponent(url.pathname + url.search)}`;
  throw redirect(`${SIGN_IN_PATH}${redirectTo}`, { headers: { "Set-Cookie": await clearedSessionCookie(request) } });
}

export async function requireRole(request: Request, ...roles: Role[]): Promise<Person> {
  const person = await requireUser(request);
  if (hasRole(person.roles, roles)) return person;
  const message = `This needs the ${roles.join(" or ")} role.`;
  if (wantsJson(request)) throw Response.json({ error: { code: "forbidden", message, details: null } }, { status: 403 });
  throw new Response(message, { status: 403, statusText: "Forbidden" });
}

async function clearedSessionCookie(request: Request): Promise<string> {
  return sessionStorage().destroySession(await getSession(request));
}

/** Starts a fresh session for a person who just proved their address; any session this browser had ends. */
export async function startSession(request: Request, person: Person): Promise<string> {
  const storage = sessionStorage();
  const previous = await getSession(request);
  if (previous.id) await storage.destroySession(previous);
  const session = await storage.getSession();
  session.set("userId", person.id);
  await recordSignIn(person.id);
  return storage.commitSession(session);
}

/** Ends this browser's session on the server and clears its cookie. */
export async function signOutRedirect(request: Request): Promise<Response> {
  return redirect(SIGN_IN_PATH, { headers: { "Set-Cookie": await clearedSessionCookie(request) } });
}

/** Ends every session a person has, on every device. */
export async function signOutEverywhere(personId: string): Promise<number> {
  return deleteSessionsOf(personId);
}
