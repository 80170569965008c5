// Sign-in and sessions tried as an attacker would: edited cookies, forged Host, token spellings, replays,
// races, revocation, floods of code requests and timing. Each case broke an earlier build of the product.
import { createHash } from "node:crypto";
import type { Sequelize } from "sequelize";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { startAppServer, type RunningApp } from "../setup/app-server.ts";
import { cookieHeader, setCookieLines, setCookiesOf } from "../setup/cookies.ts";
import { connect } from "../setup/databases.ts";
import { appUrl, newAgent, pathOf, requestCode, signIn } from "../setup/http.ts";
import { magicLinkFrom, readMails, signInCodeFrom } from "../setup/mail-catcher.ts";
import { mailCausedBy, waitForSignInQueueIdle } from "../setup/sign-in-mail.ts";

const ENGINEER = "engineer@larkfield.example.com";
const ADMIN = "admin@larkfield.example.com";
const CHALLENGE = "__betasift_challenge";
const SESSION = "__betasift";

let sequelize: Sequelize;

beforeAll(() => {
  sequelize = connect(inject("databaseUrl"));
});

afterAll(async () => {
  await sequelize.close();
});

/** A client with no cookie jar: every cookie it sends is one the test chose. */
function bare(url = appUrl()) {
  return {
    get: (path: string) => request(url).get(path).set("Origin", url),
    post: (path: string) => request(url).post(path).set("Origin", url).type("form"),
  };
}

/** Asks for a code from a cookie-less client; returns the cookies the server set and the e-mailed code and link. */
async function askForCode(email: string, form: Record<string, string> = {}) {
  const { result: asked, mail } = await mailCausedBy({ mailDir: inject("mailDir"), databaseUrl: inject("databaseUrl"), to: email }, () =>
    bare().post("/sign-in").send({ email, ...form }),
  );
  expect(asked.status).toBe(302);
  return { asked, cookies: setCookiesOf(asked), code: signInCodeFrom(mail), link: magicLinkFrom(mail) };
}

/** The challenge row behind a signed challenge cookie value (base64 JSON, a dot, the signature). */
async function challengeRow(cookieValue: string) {
  const signed = decodeURIComponent(cookieValue);
  const id = JSON.parse(Buffer.from(signed.slice(0, signed.lastIndexOf(".")), "base64").toString("utf8")) as string;
  const hash = createHash("sha256").update(id).digest("hex");
  const [rows] = await sequelize.query(`SELECT email, attempts, consumed_at FROM sign_in_challenges WHERE id_hash = :hash`, { replacements: { hash } });
  return rows[0] as { email: string; attempts: number; consumed_at: Date | null } | undefined;
}

async function whoIsSignedIn(sessionValue: string | undefined): Promise<string | null> {
  if (!sessionValue) return null;
  const page = await bare().get("/").set("Cookie", `${SESSION}=${sessionValue}`);
  if (page.status !== 200) return null;
  return /Hello, (?:<!-- -->)?(\w+)/.exec(page.text)?.[1] ?? null;
}

describe("the address being signed in cannot be swapped", () => {
  it("keeps no address in any cookie the browser holds", async () => {
    const { asked } = await askForCode(ENGINEER);
    const lines = setCookieLines(asked).join("\n");
    expect(lines).not.toMatch(/larkfield|%40|@/i);
    expect(lines).not.toMatch(/_totp=/);
    expect([...setCookiesOf(asked).keys()]).toEqual([CHALLENGE]);
  });

  it("signs in the person who asked, whatever address an edited cookie names", async () => {
    const { asked, code } = await askForCode(ENGINEER);
    // Every address in every cookie is turned into the admin's, and the old strategy cookie is forged too.
    const edited = Object.fromEntries(
      [...setCookiesOf(asked)].map(([name, value]) => [name, value.replaceAll(encodeURIComponent(ENGINEER), encodeURIComponent(ADMIN)).replaceAll(ENGINEER, ADMIN)]),
    );
    const forgedStrategyCookie = new URLSearchParams({ email: ADMIN, totp: JSON.stringify({ jwe: "forged", attempts: 0 }) }).toString();
    const verified = await bare()
      .post("/sign-in/verify")
      .set("Cookie", cookieHeader({ ...edited, _totp: forgedStrategyCookie }))
      .send({ intent: "verify", code });
    expect(verified.status).toBe(302);
    expect(await whoIsSignedIn(setCookiesOf(verified).get(SESSION))).toBe("Ravi");
  });

  it("refuses a challenge cookie whose value was edited", async () => {
    const { cookies, code } = await askForCode(ENGINEER);
    const value = cookies.get(CHALLENGE)!;
    const edited = value.slice(0, 4) + (value[4] === "A" ? "B" : "A") + value.slice(5);
    const verified = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${edited}`).send({ intent: "verify", code });
    expect(verified.status).toBe(302);
    expect(verified.headers.location).toBe("/sign-in");
    expect(setCookiesOf(verified).get(SESSION)).toBeUndefined();
  });
});

describe("links in e-mails", () => {
  it("start from the configured origin whatever Host or X-Forwarded-Host the request names, or no code is sent", async () => {
    const mailDir = inject("mailDir");
    const forged = [
      { Host: "evil.example.net:8443", Origin: appUrl() },
      { Host: "evil.example.net:8443", Origin: "http://evil.example.net:8443" },
      { "X-Forwarded-Host": "evil.example.net", Origin: appUrl() },
      { "X-Forwarded-Host": "evil.example.net", Origin: "http://evil.example.net" },
    ];
    let sent = 0;
    for (const headers of forged) {
      await waitForSignInQueueIdle(inject("databaseUrl"));
      const before = readMails(mailDir).length;
      let call = request(appUrl()).post("/sign-in").type("form");
      for (const [name, value] of Object.entries(headers)) call = call.set(name, value);
      const answer = await call.send({ email: ENGINEER });
      await waitForSignInQueueIdle(inject("databaseUrl"));
      const mails = readMails(mailDir).slice(before).filter((mail) => mail.to.includes(ENGINEER));
      if (answer.status === 302) {
        sent += 1;
        expect(mails.length, JSON.stringify(headers)).toBe(1);
      } else {
        expect(answer.status, JSON.stringify(headers)).toBeGreaterThanOrEqual(400);
        expect(mails.length, JSON.stringify(headers)).toBe(0);
      }
      for (const mail of mails) {
        expect(magicLinkFrom(mail).startsWith(`${appUrl()}/sign-in/link?t=`)).toBe(true);
        expect(mail.text).not.toContain("evil");
      }
    }
    // Forwarding headers are not trusted by default, so the plain forged X-Forwarded-Host gets through and is ignored.
    expect(sent).toBeGreaterThan(0);
  });
});

describe("the limit of wrong codes", () => {
  it("counts tries per challenge on the server: no other spelling of the cookie gets fresh tries", async () => {
    const { cookies, code } = await askForCode(ENGINEER);
    const value = cookies.get(CHALLENGE)!;
    const wrong = code === "000000" ? "111111" : "000000";
    const spellings = [`${value}%3D`, `${value}=`, `${value}==`, value.replace(/%3D/g, ""), `${value}.`, value.toUpperCase()].filter((s) => s !== value);
    for (const spelling of spellings) {
      const tried = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${spelling}`).send({ intent: "verify", code: wrong });
      expect(tried.headers.location, spelling).toBe("/sign-in");
    }
    expect((await challengeRow(value))?.attempts).toBe(0);
    for (let attempt = 0; attempt < 3; attempt += 1) {
      await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${value}`).send({ intent: "verify", code: wrong });
    }
    for (const spelling of [value, ...spellings]) {
      const late = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${spelling}`).send({ intent: "verify", code });
      expect(setCookiesOf(late).get(SESSION), spelling).toBeUndefined();
    }
    expect((await challengeRow(value))?.attempts).toBe(3);
    const page = await bare().get("/sign-in/verify").set("Cookie", `${CHALLENGE}=${value}`);
    expect(page.text).toContain("Too many wrong codes. Ask for a new one.");
    expect(page.text).not.toContain('name="code"');
  });

  it("lets parallel guesses share no try: ten at once still use at most three", async () => {
    const { cookies, code } = await askForCode(ENGINEER);
    const value = cookies.get(CHALLENGE)!;
    const guesses = Array.from({ length: 10 }, (_, i) => String((Number(code) + 1 + i) % 1_000_000).padStart(6, "0"));
    const answers = await Promise.all(guesses.map((guess) => bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${value}`).send({ intent: "verify", code: guess })));
    expect(answers.every((answer) => setCookiesOf(answer).get(SESSION) === undefined)).toBe(true);
    expect((await challengeRow(value))?.attempts).toBe(3);
  });
});

describe("a code or link is used once", () => {
  it("refuses a used code replayed from a saved copy of the challenge cookie", async () => {
    const { cookies, code } = await askForCode(ENGINEER);
    const saved = cookies.get(CHALLENGE)!;
    const first = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${saved}`).send({ intent: "verify", code });
    expect(await whoIsSignedIn(setCookiesOf(first).get(SESSION))).toBe("Ravi");
    const replay = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${saved}`).send({ intent: "verify", code });
    expect(replay.headers.location).toBe("/sign-in/verify");
    expect(setCookiesOf(replay).get(SESSION)).toBeUndefined();
    const page = await bare().get("/sign-in/verify").set("Cookie", `${CHALLENGE}=${saved}`);
    expect(page.text).toContain("That code has already been used.");
    expect((await challengeRow(saved))?.consumed_at).not.toBeNull();
  });

  it("refuses a used link replayed with the same cookie", async () => {
    const { cookies, link } = await askForCode(ENGINEER);
    const saved = cookies.get(CHALLENGE)!;
    const path = new URL(link).pathname + new URL(link).search;
    const first = await bare().get(path).set("Cookie", `${CHALLENGE}=${saved}`);
    expect(await whoIsSignedIn(setCookiesOf(first).get(SESSION))).toBe("Ravi");
    const replay = await bare().get(path).set("Cookie", `${CHALLENGE}=${saved}`);
    expect(setCookiesOf(replay).get(SESSION)).toBeUndefined();
  });

  it("lets only one of two racing right answers in", async () => {
    const { cookies, code } = await askForCode(ENGINEER);
    const saved = cookies.get(CHALLENGE)!;
    const answers = await Promise.all(
      Array.from({ length: 4 }, () => bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${saved}`).send({ intent: "verify", code })),
    );
    expect(answers.filter((answer) => setCookiesOf(answer).get(SESSION)).length).toBe(1);
  });
});

describe("sessions end when they are ended", () => {
  async function signedInSession(email: string): Promise<string> {
    const { cookies, code } = await askForCode(email);
    const verified = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${cookies.get(CHALLENGE)}`).send({ intent: "verify", code });
    const session = setCookiesOf(verified).get(SESSION);
    if (!session) throw new Error("no session cookie");
    return session;
  }

  it("holds only a random id in the cookie, never the person", async () => {
    const session = await signedInSession(ENGINEER);
    const [rows] = await sequelize.query(`SELECT id::text FROM users WHERE email = :email`, { replacements: { email: ENGINEER } });
    const userId = (rows[0] as { id: string }).id;
    const signed = decodeURIComponent(session);
    const carried = Buffer.from(signed.slice(0, signed.lastIndexOf(".")), "base64").toString("utf8");
    expect(carried).not.toContain(userId);
    expect(carried).not.toContain("userId");
  });

  it("ends a signed-out session at once, even for a saved copy of its cookie", async () => {
    const session = await signedInSession(ENGINEER);
    expect(await whoIsSignedIn(session)).toBe("Ravi");
    const out = await bare().post("/sign-out").set("Cookie", `${SESSION}=${session}`);
    expect(out.headers.location).toBe("/sign-in");
    expect(await whoIsSignedIn(session)).toBeNull();
    const api = await request(appUrl()).get("/api/parts").set("Cookie", `${SESSION}=${session}`);
    expect(api.status).toBe(401);
  });

  it("renews the id at sign-in: the session held before it no longer answers", async () => {
    const agent = newAgent();
    await signIn(agent, ENGINEER);
    const first = await signedInSession(ENGINEER);
    const { cookies, code } = await askForCode(ENGINEER);
    const again = await bare()
      .post("/sign-in/verify")
      .set("Cookie", cookieHeader({ [SESSION]: first, [CHALLENGE]: cookies.get(CHALLENGE)! }))
      .send({ intent: "verify", code });
    const second = setCookiesOf(again).get(SESSION);
    expect(second).toBeTruthy();
    expect(second).not.toBe(first);
    expect(await whoIsSignedIn(first)).toBeNull();
    expect(await whoIsSignedIn(second)).toBe("Ravi");
  });

  it("ends every session of a person when an admin signs them out everywhere, and deactivation revives none", async () => {
    const email = `everywhere-${Date.now()}@larkfield.example.com`;
    await sequelize.query(
      `INSERT INTO users (id, email, display_name, active, created_at, updated_at) VALUES (gen_random_uuid(), :email, 'Avery Lindqvist', true, now(), now())`,
      { replacements: { email } },
    );
    const [rows] = await sequelize.query(`SELECT id::text FROM users WHERE email = :email`, { replacements: { email } });
    const personId = (rows[0] as { id: string }).id;
    const phone = await signedInSession(email);
    const laptop = await signedInSession(email);
    expect(await whoIsSignedIn(phone)).toBe("Avery");

    const admin = newAgent();
    await signIn(admin, ADMIN);
    const page = await admin.get(`/people/${personId}`);
    expect(page.text).toContain("2 open sessions");
    const ended = await admin.post(`/people/${personId}`).type("form").send({ intent: "sign-out-everywhere" });
    expect(ended.status).toBe(200);
    expect(ended.text).toContain("Avery Lindqvist is signed out everywhere (2 sessions ended).");
    expect(await whoIsSignedIn(phone)).toBeNull();
    expect(await whoIsSignedIn(laptop)).toBeNull();

    const tablet = await signedInSession(email);
    await admin.post(`/people/${personId}`).type("form").send({ intent: "deactivate" });
    expect(await whoIsSignedIn(tablet)).toBeNull();
    await admin.post(`/people/${personId}`).type("form").send({ intent: "reactivate" });
    expect(await whoIsSignedIn(tablet)).toBeNull();
  });
});

describe("asking for codes is limited, on every instance at once", () => {
  let first: RunningApp;
  let second: RunningApp;
  // Default limits; the client address comes from X-Forwarded-For so each case has an address of its own.
  const limitedEnv = () => ({
    DATABASE_URL: inject("databaseUrl"),
    SMTP_PORT: String(inject("smtpPort")),
    SIGN_IN_CODES_PER_ADDRESS: "5",
    SIGN_IN_CODES_PER_CLIENT: "30",
    TRUST_PROXY: "1",
  });

  beforeAll(async () => {
    first = await startAppServer(limitedEnv());
    second = await startAppServer(limitedEnv());
  });

  afterAll(async () => {
    await Promise.all([first?.stop(), second?.stop()]);
  });

  async function newPerson(prefix: string): Promise<string> {
    const email = `${prefix}-${Date.now()}-${Math.round(Math.random() * 1e6)}@larkfield.example.com`;
    await sequelize.query(
      `INSERT INTO users (id, email, display_name, active, created_at, updated_at) VALUES (gen_random_uuid(), :email, 'Rowan Achterberg', true, now(), now())`,
      { replacements: { email } },
    );
    return email;
  }

  const ask = (app: RunningApp, email: string, client: string) =>
    request(app.url).post("/sign-in").set("Origin", app.url).set("X-Forwarded-For", client).type("form").send({ email });

  async function mailsSettled(email: string, expected: number): Promise<number> {
    const mailDir = inject("mailDir");
    const count = () => readMails(mailDir).filter((mail) => mail.to.includes(email)).length;
    const deadline = Date.now() + 30_000;
    while (count() < expected && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 200));
    // Anything past the limit would have been queued with the others; give the queue a moment more.
    await new Promise((resolve) => setTimeout(resolve, 1500));
    return count();
  }

  it("sends five codes to one address and refuses the sixth with a clear message and Retry-After", async () => {
    const email = await newPerson("flood");
    const answers = [];
    for (let i = 0; i < 6; i += 1) answers.push(await ask(first, email, `198.51.100.${10 + i}`));
    expect(answers.slice(0, 5).map((a) => a.status)).toEqual([302, 302, 302, 302, 302]);
    const refused = answers[5]!;
    expect(refused.status).toBe(429);
    expect(Number(refused.headers["retry-after"])).toBeGreaterThan(0);
    expect(refused.text).toContain("Too many codes were asked for this address. Wait 15 minutes, then ask again");
    expect(await mailsSettled(email, 5)).toBe(5);
  });

  it("counts one address across two app instances", async () => {
    const email = await newPerson("two-instances");
    const statuses = [];
    for (let i = 0; i < 6; i += 1) statuses.push((await ask(i % 2 === 0 ? first : second, email, `198.51.100.${40 + i}`)).status);
    expect(statuses).toEqual([302, 302, 302, 302, 302, 429]);
  });

  it("limits one client asking for many addresses", async () => {
    const client = "203.0.113.77";
    const statuses = [];
    for (let i = 0; i < 31; i += 1) statuses.push((await ask(i % 2 === 0 ? first : second, `nobody-${Date.now()}-${i}@larkfield.example.com`, client)).status);
    expect(statuses.slice(0, 30).every((status) => status === 302)).toBe(true);
    const refused = await ask(first, `nobody-else-${Date.now()}@larkfield.example.com`, client);
    expect(refused.status).toBe(429);
    expect(refused.text).toContain("Too many codes were asked from this network.");
    const elsewhere = await ask(first, `nobody-else-${Date.now()}@larkfield.example.com`, "203.0.113.78");
    expect(elsewhere.status).toBe(302);
  });
});

describe("known and unknown addresses", () => {
  it("cost the same work: each request queues one e-mail job, and the queue drops the unknown one", async () => {
    const queued = async () => {
      const [rows] = await sequelize.query(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'sign-in-mail'`);
      return (rows[0] as { n: number }).n;
    };
    const before = await queued();
    const unknown = await bare().post("/sign-in").send({ email: `nobody-${Date.now()}@larkfield.example.com` });
    const afterUnknown = await queued();
    const known = await bare().post("/sign-in").send({ email: ENGINEER });
    const afterKnown = await queued();
    expect(afterUnknown - before).toBe(1);
    expect(afterKnown - afterUnknown).toBe(1);
    expect(unknown.status).toBe(known.status);
    expect(unknown.headers.location).toBe(known.headers.location);
    expect([...setCookiesOf(unknown).keys()]).toEqual([...setCookiesOf(known).keys()]);
    await waitForSignInQueueIdle(inject("databaseUrl"));
  });
});

describe("after sign-in", () => {
  it("goes back to the page that asked for it, and never off the site", async () => {
    const fromCatalogue = await bare().get("/catalogue?sort=vceo");
    expect(pathOf(fromCatalogue.headers.location)).toBe("/sign-in");
    const target = new URL(fromCatalogue.headers.location!, appUrl()).searchParams.get("redirectTo");
    expect(target).toBe("/catalogue?sort=vceo");

    for (const [asked, expected] of [
      ["/catalogue?sort=vceo", "/catalogue?sort=vceo"],
      ["//evil.example.net/x", "/"],
      ["https://evil.example.net/", "/"],
      ["/\\evil.example.net", "/"],
      ["/sign-out", "/"],
    ] as const) {
      const { cookies, code } = await askForCode(ENGINEER, { redirectTo: asked });
      const challenge = cookies.get(CHALLENGE)!;
      const verified = await bare().post("/sign-in/verify").set("Cookie", `${CHALLENGE}=${challenge}`).send({ intent: "verify", code });
      expect(verified.headers.location, asked).toBe(expected);
    }
  });
});
