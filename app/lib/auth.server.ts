import { redirect } from "react-router";
import { Authenticator } from "remix-auth";
import { TOTPStrategy } from "remix-auth-totp";
import { countFailures, recordFailure } from "#app/data/sign-in-failures.server.ts";
import { findPersonByEmail, findPersonById, recordSignIn, type Person } from "#app/data/users.server.ts";
import { cookieIsSecure, env } from "./env.server.ts";
import { readFormData } from "./forms.ts";
import { sendMail } from "./mail.server.ts";
import { hasRole, type Role } from "./roles.ts";
import { getSession, sessionStorage } from "./session.server.ts";
import { signInCodeMail } from "./sign-in-mail.ts";

export const SIGN_IN_PATH = "/sign-in";
export const VERIFY_PATH = "/sign-in/verify";
export const MAGIC_LINK_PATH = "/sign-in/link";

export const SIGN_IN_ERRORS = {
  invalidTotp: "That code is not the one we sent. Check the e-mail and try again.",
  expiredTotp: "That code has expired. Ask for a new one.",
  rateLimitExceeded: "Too many wrong codes. Ask for a new one.",
  missingSessionEmail: "Start by typing your e-mail address.",
  missingSessionTotp: "Ask for a code first.",
  requiredEmail: "Type your e-mail address.",
  invalidEmail: "That is not an e-mail address.",
  noAccount: "That code is not the one we sent. Check the e-mail and try again.",
} as const;

async function createdSessionRedirect(person: Person, request: Request): Promise<never> {
  const session = await getSession(request);
  session.set("userId", person.id);
  await recordSignIn(person.id);
  throw redirect("/", { headers: { "Set-Cookie": await sessionStorage().commitSession(session) } });
}

function createAuthenticator() {
  const authenticator = new Authenticator<Person>();
  authenticator.use(
    new TOTPStrategy<Person>(
      {
        secret: env().TOTP_SECRET,
        totpGeneration: { period: env().TOTP_PERIOD_SECONDS, maxAttempts: env().TOTP_MAX_ATTEMPTS, digits: 6, charSet: "0123456789" },
        cookieOptions: { ...(cookieIsSecure() ? { secure: true as const } : {}), maxAge: Math.max(env().TOTP_PERIOD_SECONDS, 300) },
        magicLinkPath: MAGIC_LINK_PATH,
        customErrors: SIGN_IN_ERRORS,
        emailSentRedirect: VERIFY_PATH,
        successRedirect: "/",
        failureRedirect: VERIFY_PATH,
        // Unknown and deactivated addresses get the same answer as known ones, and no e-mail.
        sendTOTP: async ({ email, code, magicLink }) => {
          const person = await findPersonByEmail(email);
          if (!person || !person.active) return;
          await sendMail(signInCodeMail({ to: person.email, displayName: person.displayName, code, magicLink, minutes: env().TOTP_PERIOD_SECONDS / 60 }));
        },
      },
      async ({ email, request }) => {
        const person = await findPersonByEmail(email);
        if (!person || !person.active) throw new Error(SIGN_IN_ERRORS.noAccount);
        return createdSessionRedirect(person, request);
      },
    ),
    "totp",
  );
  return authenticator;
}

let authenticator: Authenticator<Person> | undefined;

/** The strategy's own cookie, written the way it writes it, to end a challenge with a message. */
function endedChallengeCookie(email: string | null, error: string): string {
  const params = new URLSearchParams();
  if (email) params.set("email", email);
  params.set("error", error);
  return [`_totp=${params.toString()}`, "Path=/", "Max-Age=300", ...(cookieIsSecure() ? ["Secure"] : []), "HttpOnly", "SameSite=Lax"].join("; ");
}

function errorIn(response: Response): string | null {
  const cookie = response.headers.getSetCookie().find((c) => c.startsWith("_totp="));
  return cookie ? parseCodeCookie(cookie.slice("_totp=".length).split(";")[0]!).error : null;
}

/**
 * Runs the e-mailed-code strategy; it always answers by throwing a redirect.
 * Wrong codes are counted here, on the server: the strategy itself only limits bad links.
 */
export async function authenticateWithCode(request: Request): Promise<never> {
  authenticator ??= createAuthenticator();
  const state = readCodeState(request);
  const typedCode = request.method === "POST" && Boolean((await readFormData(request))?.get("code"));
  const challenge = typedCode ? state.challenge : null;
  const lockedOut = () =>
    redirect(VERIFY_PATH, { headers: { "Set-Cookie": endedChallengeCookie(state.email, SIGN_IN_ERRORS.rateLimitExceeded) } });
  if (typedCode && !challenge && state.error === SIGN_IN_ERRORS.rateLimitExceeded) throw lockedOut();
  if (challenge && (await countFailures(challenge)) >= env().TOTP_MAX_ATTEMPTS) throw lockedOut();
  try {
    await authenticator.authenticate("totp", request);
  } catch (thrown) {
    if (challenge && thrown instanceof Response && errorIn(thrown) === SIGN_IN_ERRORS.invalidTotp) {
      if ((await recordFailure(challenge)) >= env().TOTP_MAX_ATTEMPTS) throw lockedOut();
    }
    throw thrown;
  }
  throw redirect(VERIFY_PATH);
}

/** The signed-in person, or null. A deactivated person counts as signed out from the next request on. */
export async function getOptionalUser(request: Request): Promise<Person | null> {
  const session = await getSession(request);
  const userId = session.get("userId");
  if (!userId) return null;
  const person = await findPersonById(userId);
  return person && person.active ? person : null;
}

function wantsJson(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}

export async function requireUser(request: Request): Promise<Person> {
  const person = await getOptionalUser(request);
  if (person) return person;
  if (wantsJson(request)) {
    throw Response.json({ error: { code: "unauthenticated", message: "Sign in first.", details: null } }, { status: 401 });
  }
  const url = new URL(request.url);
  const redirectTo = url.pathname === "/" ? "" : `?redirectTo=${encodeURIComponent(url.pathname + url.search)}`;
  const session = await getSession(request);
  throw redirect(`${SIGN_IN_PATH}${redirectTo}`, { headers: { "Set-Cookie": await sessionStorage().destroySession(session) } });
}

export async function requireRole(request: Request, ...roles: Role[]): Promise<Person> {
  const person = await requireUser(request);
  if (hasRole(person.roles, roles)) return person;
  const message = `This needs the ${roles.join(" or ")} role.`;
  if (wantsJson(request)) throw Response.json({ error: { code: "forbidden", message, details: null } }, { status: 403 });
  throw new Response(message, { status: 403, statusText: "Forbidden" });
}

export async function signOutRedirect(request: Request): Promise<Response> {
  const session = await getSession(request);
  return redirect(SIGN_IN_PATH, { headers: { "Set-Cookie": await sessionStorage().destroySession(session) } });
}

interface CodeState {
  email: string | null;
  hasCode: boolean;
  /** The encrypted challenge of the code in flight: the key for counting wrong codes. */
  challenge: string | null;
  error: string | null;
}

function parseCodeCookie(raw: string): CodeState {
  const params = new URLSearchParams(raw.replace(/^"|"$/g, ""));
  let challenge: string | null = null;
  const totp = params.get("totp");
  if (totp) {
    try {
      const parsed = JSON.parse(totp) as { jwe?: unknown };
      challenge = typeof parsed.jwe === "string" ? parsed.jwe : null;
    } catch {
      challenge = null;
    }
  }
  return { email: params.get("email"), hasCode: challenge !== null, challenge, error: params.get("error") };
}

/** What the e-mailed-code strategy keeps in its own cookie between the two steps. */
export function readCodeState(request: Request): CodeState {
  const raw = (request.headers.get("Cookie") ?? "")
    .split(/;\s*/)
    .find((part) => part.startsWith("_totp="))
    ?.slice("_totp=".length);
  return raw ? parseCodeCookie(raw) : { email: null, hasCode: false, challenge: null, error: null };
}
