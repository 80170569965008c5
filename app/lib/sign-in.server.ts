// Sign-in with an e-mailed code. remix-auth-totp makes and checks the code and the link; everything that says
// who is signing in, how many tries are left and whether the code was used lives in a server-side challenge
// (app/data/sign-in-challenges.server.ts). The browser holds only a signed random challenge id: the strategy's
// own cookie is rebuilt from the challenge for each call and never sent to the browser.
import { randomUUID } from "node:crypto";
import { createCookie } from "react-router";
import { Authenticator } from "remix-auth";
import { TOTPStrategy } from "remix-auth-totp";
import {
  consumeChallenge,
  createChallenge,
  findChallenge,
  recordChallengeError,
  takeAttempt,
  type ChallengeError,
  type SignInChallenge,
} from "#app/data/sign-in-challenges.server.ts";
import { findPersonByEmail, normaliseEmail, type Person } from "#app/data/users.server.ts";
import { cookieIsSecure, env } from "./env.server.ts";
import { queueSignInMail } from "./jobs.server.ts";
import { publicUrl } from "./public-url.server.ts";
import { takeSignInCodeAllowance } from "./rate-limit.server.ts";
import { readStrictCookie } from "./strict-cookie.server.ts";

export const SIGN_IN_PATH = "/sign-in";
export const VERIFY_PATH = "/sign-in/verify";
export const MAGIC_LINK_PATH = "/sign-in/link";

export const SIGN_IN_MESSAGES: Record<ChallengeError, string> = {
  "invalid-code": "That code is not the one we sent. Check the e-mail and try again.",
  expired: "That code has expired. Ask for a new one.",
  "too-many-attempts": "Too many wrong codes. Ask for a new one.",
  used: "That code has already been used. Ask for a new one to sign in again.",
  // Never tells an unknown address from a known one.
  "no-account": "That code is not the one we sent. Check the e-mail and try again.",
};

// The strategy writes its errors into its own cookie; these codes are all it is given to write.
const STRATEGY_ERRORS = {
  invalidTotp: "invalid-code",
  expiredTotp: "expired",
  rateLimitExceeded: "too-many-attempts",
  missingSessionEmail: "invalid-code",
  missingSessionTotp: "invalid-code",
  requiredEmail: "invalid-code",
  invalidEmail: "invalid-code",
} as const satisfies Record<string, ChallengeError>;

const STRATEGY_COOKIE = "_totp";

interface StrategyCall {
  issued?: { code: string; magicLink: string };
  verified?: boolean;
}

// What the strategy hands to its callbacks, per call. remix-auth copies the request, so calls are told apart
// by a header of our own on the request we make, not by the request object.
const CALL_HEADER = "x-betasift-sign-in-call";
const calls = new Map<string, StrategyCall>();

function callOf(request: Request): StrategyCall | undefined {
  return calls.get(request.headers.get(CALL_HEADER) ?? "");
}
let authenticator: Authenticator<void> | undefined;

function strategy(): Authenticator<void> {
  if (authenticator) return authenticator;
  authenticator = new Authenticator<void>();
  authenticator.use(
    new TOTPStrategy<void>(
      {
        secret: env().TOTP_SECRET,
        totpGeneration: { period: env().TOTP_PERIOD_SECONDS, maxAttempts: env().TOTP_MAX_ATTEMPTS, digits: 6, charSet: "0123456789" },
        magicLinkPath: MAGIC_LINK_PATH,
        customErrors: STRATEGY_ERRORS,
        emailSentRedirect: VERIFY_PATH,
        successRedirect: "/",
        failureRedirect: VERIFY_PATH,
        sendTOTP: async ({ code, magicLink, request }) => {
          const call = callOf(request);
          if (call) call.issued = { code, magicLink };
        },
      },
      async ({ request }) => {
        const call = callOf(request);
        if (call) call.verified = true;
      },
    ),
    "totp",
  );
  return authenticator;
}

/** Runs the strategy on a request of our own making; it always answers by throwing a redirect. */
async function runStrategy(url: string, init: { method: "GET" | "POST"; cookie?: string; form?: Record<string, string> }) {
  const callId = randomUUID();
  const call: StrategyCall = {};
  const headers = new Headers({ [CALL_HEADER]: callId });
  if (init.cookie) headers.set("Cookie", init.cookie);
  const request = new Request(url, { method: init.method, headers, ...(init.form ? { body: new URLSearchParams(init.form) } : {}) });
  calls.set(callId, call);
  let answer: unknown;
  try {
    await strategy().authenticate("totp", request);
  } catch (thrown) {
    answer = thrown;
  } finally {
    calls.delete(callId);
  }
  if (!(answer instanceof Response)) throw answer instanceof Error ? answer : new Error("the sign-in strategy answered without a redirect");
  const raw = answer.headers.getSetCookie().find((cookie) => cookie.startsWith(`${STRATEGY_COOKIE}=`)) ?? "";
  return { call, strategyCookie: new URLSearchParams(raw.slice(STRATEGY_COOKIE.length + 1).split(";")[0] ?? "") };
}

let challengeCookie: ReturnType<typeof createCookie> | undefined;

// Scoped to the sign-in pages and signed, so it is neither sent elsewhere nor forged.
function challengeIdCookie() {
  challengeCookie ??= createCookie("__betasift_challenge", {
    httpOnly: true,
    sameSite: "lax",
    path: SIGN_IN_PATH,
    secure: cookieIsSecure(),
    secrets: [env().SESSION_SECRET],
    maxAge: Math.max(env().TOTP_PERIOD_SECONDS, 300),
  });
  return challengeCookie;
}

export function readChallengeId(request: Request): Promise<string | null> {
  return readStrictCookie(challengeIdCookie(), request);
}

export async function clearChallengeCookie(): Promise<string> {
  return challengeIdCookie().serialize("", { maxAge: 0 });
}

/** The challenge this browser holds, if any. */
export async function currentChallenge(request: Request): Promise<{ id: string; challenge: SignInChallenge } | null> {
  const id = await readChallengeId(request);
  const challenge = id ? await findChallenge(id) : null;
  return id && challenge ? { id, challenge } : null;
}

export type SendCodeResult = { ok: true; setCookie: string } | { ok: false; status: 429; retryAfterSeconds: number; message: string };

function minutesText(seconds: number): string {
  const minutes = Math.ceil(seconds / 60);
  return minutes <= 1 ? "a minute" : `${minutes} minutes`;
}

/**
 * Issues a code for an address: the same work whether or not the address has an account (the e-mail is queued,
 * and the queue drops unknown addresses), so neither the answer nor its timing tells them apart.
 */
export async function sendSignInCode(input: { email: string; redirectTo: string | null; clientAddress: string }): Promise<SendCodeResult> {
  const email = normaliseEmail(input.email);
  const allowance = await takeSignInCodeAllowance({ email, clientAddress: input.clientAddress });
  if (!allowance.ok) {
    const wait = minutesText(allowance.retryAfterSeconds);
    const message =
      allowance.scope === "address"
        ? `Too many codes were asked for this address. Wait ${wait}, then ask again; the codes already sent still work.`
        : `Too many codes were asked from this network. Wait ${wait}, then ask again.`;
    return { ok: false, status: 429, retryAfterSeconds: allowance.retryAfterSeconds, message };
  }
  const { call, strategyCookie } = await runStrategy(publicUrl(SIGN_IN_PATH), { method: "POST", form: { email } });
  const sealedCode = (JSON.parse(strategyCookie.get("totp") ?? "null") as { jwe?: unknown } | null)?.jwe;
  if (!call.issued || typeof sealedCode !== "string") throw new Error("the sign-in strategy issued no code");
  const id = await createChallenge({ email, sealedCode, redirectTo: input.redirectTo, lifetimeSeconds: env().TOTP_PERIOD_SECONDS });
  await queueSignInMail({ email, code: call.issued.code, magicLink: call.issued.magicLink });
  return { ok: true, setCookie: await challengeIdCookie().serialize(id) };
}

export type VerifyResult =
  | { ok: true; person: Person; redirectTo: string | null }
  | { ok: false; error: ChallengeError }
  | { ok: false; error: "no-challenge" };

function endedBy(challenge: SignInChallenge): ChallengeError | null {
  if (challenge.consumed) return "used";
  if (challenge.expired) return "expired";
  if (challenge.attempts >= env().TOTP_MAX_ATTEMPTS) return "too-many-attempts";
  return null;
}

/** Whether the challenge can still take a code (the verify page hides the code field otherwise). */
export function challengeIsOpen(challenge: SignInChallenge): boolean {
  return endedBy(challenge) === null;
}

/**
 * Checks a typed code or an e-mailed link against this browser's challenge. One try is taken before the check,
 * the challenge is used up on success, and the address always comes from the server's record.
 */
export async function verifySignIn(request: Request, typedCode: string | null): Promise<VerifyResult> {
  const current = await currentChallenge(request);
  if (!current) return { ok: false, error: "no-challenge" };
  const { id, challenge } = current;
  const ended = endedBy(challenge);
  if (ended) {
    await recordChallengeError(id, ended);
    return { ok: false, error: ended };
  }
  if (!(await takeAttempt(id, env().TOTP_MAX_ATTEMPTS))) {
    const now = await findChallenge(id);
    const error = (now && endedBy(now)) ?? "too-many-attempts";
    await recordChallengeError(id, error);
    return { ok: false, error };
  }
  const incoming = new URL(request.url);
  const strategyState = new URLSearchParams({ email: challenge.email, totp: JSON.stringify({ jwe: challenge.sealedCode, attempts: 0 }) });
  const { call, strategyCookie } = await runStrategy(publicUrl(incoming.pathname + incoming.search), {
    method: typedCode === null ? "GET" : "POST",
    cookie: `${STRATEGY_COOKIE}=${strategyState.toString()}`,
    ...(typedCode === null ? {} : { form: { code: typedCode } }),
  });
  if (!call.verified) {
    const said = strategyCookie.get("error") as ChallengeError | null;
    const afterTry = await findChallenge(id);
    let error: ChallengeError = said && said in SIGN_IN_MESSAGES ? said : "invalid-code";
    if (error === "invalid-code" && afterTry && afterTry.attempts >= env().TOTP_MAX_ATTEMPTS) error = "too-many-attempts";
    await recordChallengeError(id, error);
    return { ok: false, error };
  }
  if (!(await consumeChallenge(id))) return { ok: false, error: "used" };
  const person = await findPersonByEmail(challenge.email);
  if (!person || !person.active) {
    await recordChallengeError(id, "no-account");
    return { ok: false, error: "no-account" };
  }
  return { ok: true, person, redirectTo: challenge.redirectTo };
}

/**
 * A same-origin path to go to after sign-in, or null: no other origin, no protocol-relative "//host",
 * no backslash tricks, and never back into the sign-in pages.
 */
export function safeRedirectPath(value: unknown): string | null {
  if (typeof value !== "string" || value.length === 0 || value.length > 2000) return null;
  if (!value.startsWith("/") || value.startsWith("//") || value.includes("\\") || /[\u0000-\u001f\u007f]/.test(value)) return null;
  const base = "http://betasift.invalid";
  let url: URL;
  try {
    url = new URL(value, base);
  } catch {
    return null;
  }
  if (url.origin !== base) return null;
  if (url.pathname === SIGN_IN_PATH || url.pathname.startsWith(`${SIGN_IN_PATH}/`) || url.pathname === "/sign-out") return null;
  return `${url.pathname}${url.search}${url.hash}`;
}
