import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { startAppServer, type RunningApp } from "../setup/app-server.ts";
import { connect } from "../setup/databases.ts";
import { readMails, waitForMail } from "../setup/mail-catcher.ts";
import { newAgent, pathOf, requestCode, signIn } from "../setup/http.ts";
import { waitForSignInQueueIdle } from "../setup/sign-in-mail.ts";

const ENGINEER = "engineer@larkfield.example.com";

describe("sign-in with an e-mailed code", () => {
  it("requests a code, reads the e-mail, verifies and reaches the dashboard", async () => {
    const agent = newAgent();
    const { code, mail } = await requestCode(agent, ENGINEER);
    expect(mail.subject).toContain(code);
    const verifyPage = await agent.get("/sign-in/verify");
    expect(verifyPage.status).toBe(200);
    expect(verifyPage.text).toContain(ENGINEER);
    const verified = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code });
    expect(verified.status).toBe(302);
    expect(verified.headers.location).toBe("/");
    const sessionCookie = String(verified.headers["set-cookie"]);
    expect(sessionCookie).toMatch(/__betasift=.*HttpOnly/i);
    expect(sessionCookie).toMatch(/SameSite=Lax/i);
    const dashboard = await agent.get("/");
    expect(dashboard.status).toBe(200);
    expect(dashboard.text).toContain("Ravi");
    expect(dashboard.text).toContain("Find the right transistor");
  });

  it("signs in through the e-mailed link in the same browser", async () => {
    const agent = newAgent();
    const { link } = await requestCode(agent, ENGINEER);
    const followed = await agent.get(new URL(link).pathname + new URL(link).search);
    expect(followed.status).toBe(302);
    expect(followed.headers.location).toBe("/");
    expect((await agent.get("/")).status).toBe(200);
  });

  it("refuses the e-mailed link in another browser", async () => {
    const { link } = await requestCode(newAgent(), ENGINEER);
    const stranger = newAgent();
    const followed = await stranger.get(new URL(link).pathname + new URL(link).search);
    expect(followed.status).toBe(302);
    expect(pathOf(followed.headers.location)).not.toBe("/");
    expect(pathOf((await stranger.get("/")).headers.location)).toBe("/sign-in");
  });

  it("rejects a wrong code with a message and still accepts the right one after", async () => {
    const agent = newAgent();
    const { code } = await requestCode(agent, ENGINEER);
    const wrong = code === "000000" ? "111111" : "000000";
    const refused = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code: wrong });
    expect(refused.status).toBe(302);
    expect(refused.headers.location).toBe("/sign-in/verify");
    expect((await agent.get("/sign-in/verify")).text).toContain("That code is not the one we sent");
    const accepted = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code });
    expect(accepted.headers.location).toBe("/");
  });

  it("stops after too many wrong codes, even when the right one follows", async () => {
    const agent = newAgent();
    const { code } = await requestCode(agent, ENGINEER);
    const wrong = code === "000000" ? "111111" : "000000";
    for (let attempt = 0; attempt < 3; attempt += 1) {
      await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code: wrong });
    }
    const late = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code });
    expect(late.headers.location).toBe("/sign-in/verify");
    expect((await agent.get("/sign-in/verify")).text).toContain("Too many wrong codes");
    expect(pathOf((await agent.get("/")).headers.location)).toBe("/sign-in");
  });

  it("answers an unknown address exactly like a known one and sends no e-mail", async () => {
    const mailDir = inject("mailDir");
    const unknownAddress = "nobody@larkfield.example.com";
    const mailsTo = (address: string) => readMails(mailDir).filter((m) => m.to.includes(address)).length;
    const knownBefore = mailsTo(ENGINEER);
    const since = Date.now();
    const agent = newAgent();
    const unknown = await agent.post("/sign-in").type("form").send({ email: unknownAddress });
    const known = await newAgent().post("/sign-in").type("form").send({ email: ENGINEER });
    expect(unknown.status).toBe(known.status);
    expect(unknown.headers.location).toBe(known.headers.location);
    const page = await agent.get("/sign-in/verify");
    expect(page.text).toContain(`If <strong>${unknownAddress}</strong> has a Betasift account`);
    await waitForMail(mailDir, ENGINEER, since);
    await waitForSignInQueueIdle(inject("databaseUrl"));
    expect(mailsTo(ENGINEER)).toBe(knownBefore + 1);
    expect(mailsTo(unknownAddress)).toBe(0);
    const guess = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code: "123456" });
    expect(guess.headers.location).toBe("/sign-in/verify");
  });

  it("tells what is wrong with bad input, never a 500", async () => {
    const agent = newAgent();
    const malformed = await agent.post("/sign-in").type("form").send({ email: "ravi at larkfield" });
    expect(malformed.status).toBe(400);
    expect(malformed.text).toContain("That is not an e-mail address");
    const empty = await agent.post("/sign-in").type("form").send({ email: "" });
    expect(empty.status).toBe(400);
    expect(empty.text).toContain("Type your e-mail address.");
    const noBody = await agent.post("/sign-in");
    expect(noBody.status).toBe(400);
    expect(noBody.text).toContain("The request had no form data");

    await requestCode(agent, ENGINEER);
    const emptyCode = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code: "" });
    expect(emptyCode.status).toBe(400);
    expect(emptyCode.text).toContain("Type the code from the e-mail.");
    const letters = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code: "12ab56" });
    expect(letters.status).toBe(400);
    expect(letters.text).toContain("The code is made of digits only.");
    const verifyNoBody = await agent.post("/sign-in/verify");
    expect(verifyNoBody.status).toBe(400);
  });

  it("sends a person without the code state back to the address form", async () => {
    const response = await newAgent().get("/sign-in/verify");
    expect(response.status).toBe(302);
    expect(response.headers.location).toBe("/sign-in");
  });

  it("treats a tampered session cookie as signed out", async () => {
    const agent = newAgent();
    await signIn(agent, ENGINEER);
    const good = await agent.get("/");
    expect(good.status).toBe(200);
    const signedIn = newAgent();
    const { code } = await requestCode(signedIn, ENGINEER);
    const verified = await signedIn.post("/sign-in/verify").type("form").send({ intent: "verify", code });
    const setCookies = ([] as string[]).concat(verified.headers["set-cookie"] ?? []);
    const session = setCookies.map((c) => /^__betasift=([^;]+)/.exec(c)?.[1]).find(Boolean);
    expect(session).toBeTruthy();
    const tampered = session!.slice(0, -3) + (session!.endsWith("abc") ? "xyz" : "abc");
    const stranger = newAgent();
    const response = await stranger.get("/").set("Cookie", `__betasift=${tampered}`);
    expect(response.status).toBe(302);
    expect(response.headers.location).toBe("/sign-in");
    const garbage = await newAgent().get("/people").set("Cookie", "__betasift=%%%not-a-cookie");
    expect(garbage.status).toBe(302);
    expect(pathOf(garbage.headers.location)).toBe("/sign-in");
  });

  it("signs out with a POST", async () => {
    const agent = newAgent();
    await signIn(agent, ENGINEER);
    const out = await agent.post("/sign-out");
    expect(out.status).toBe(302);
    expect(out.headers.location).toBe("/sign-in");
    expect(pathOf((await agent.get("/")).headers.location)).toBe("/sign-in");
  });
});

describe("deactivated people", () => {
  const email = "deactivate.me@larkfield.example.com";
  let sequelize: ReturnType<typeof connect>;

  beforeAll(async () => {
    sequelize = connect(inject("databaseUrl"));
    await sequelize.query(
      `INSERT INTO users (id, email, display_name, active, created_at, updated_at) VALUES (gen_random_uuid(), :email, 'Temporary Person', true, now(), now())
       ON CONFLICT (email) DO UPDATE SET active = true`,
      { replacements: { email } },
    );
    await sequelize.query(`INSERT INTO user_roles (user_id, role, created_at) SELECT id, 'engineer', now() FROM users WHERE email = :email ON CONFLICT DO NOTHING`, {
      replacements: { email },
    });
  });

  afterAll(async () => {
    await sequelize.close();
  });

  it("loses an open session on the next request and gets no code afterwards", async () => {
    const agent = newAgent();
    await signIn(agent, email);
    expect((await agent.get("/")).status).toBe(200);
    await sequelize.query(`UPDATE users SET active = false, deactivated_at = now() WHERE email = :email`, { replacements: { email } });
    const next = await agent.get("/");
    expect(next.status).toBe(302);
    expect(next.headers.location).toBe("/sign-in");

    const mailDir = inject("mailDir");
    const mailsToPerson = () => readMails(mailDir).filter((m) => m.to.includes(email)).length;
    const before = mailsToPerson();
    const again = await newAgent().post("/sign-in").type("form").send({ email });
    expect(again.headers.location).toBe("/sign-in/verify");
    await waitForSignInQueueIdle(inject("databaseUrl"));
    expect(mailsToPerson()).toBe(before);
  });
});

describe("expired codes", () => {
  let shortLived: RunningApp;

  beforeAll(async () => {
    shortLived = await startAppServer({ DATABASE_URL: inject("databaseUrl"), SMTP_PORT: String(inject("smtpPort")), TOTP_PERIOD_SECONDS: "1" });
  });

  afterAll(async () => {
    await shortLived.stop();
  });

  it("refuses a code typed after it expired and asks for a new one", async () => {
    const agent = newAgent(shortLived.url);
    const { code } = await requestCode(agent, ENGINEER);
    await new Promise((resolve) => setTimeout(resolve, 1600));
    const late = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code });
    expect(late.headers.location).toBe("/sign-in/verify");
    const page = await agent.get("/sign-in/verify");
    expect(page.text).toContain("That code has expired. Ask for a new one.");
    expect(pathOf((await agent.get("/")).headers.location)).toBe("/sign-in");
  });
});
