import request from "supertest";
import { inject } from "vitest";
import { magicLinkFrom, signInCodeFrom } from "./mail-catcher.ts";
import { mailCausedBy } from "./sign-in-mail.ts";

export type Agent = ReturnType<typeof request.agent>;

export function appUrl(): string {
  return inject("appUrl");
}

/** A client like a browser on a page of the app: it sends the app's Origin on every request, as browsers do. */
export function newAgent(url = appUrl()): Agent {
  return request.agent(url).set("Origin", url);
}

/** Asks for a code through the sign-in form and returns the e-mailed code and link. */
export async function requestCode(agent: Agent, email: string, mailDir = inject("mailDir")) {
  const { result: response, mail } = await mailCausedBy({ mailDir, databaseUrl: inject("databaseUrl"), to: email }, async () => {
    const answer = await agent.post("/sign-in").type("form").send({ email });
    if (answer.status !== 302) throw new Error(`sign-in answered ${answer.status}: ${answer.text.slice(0, 200)}`);
    return answer;
  });
  return { code: signInCodeFrom(mail), link: magicLinkFrom(mail), mail, response };
}

/** The whole sign-in as a person does it: address, e-mailed code, verify. */
export async function signIn(agent: Agent, email: string): Promise<void> {
  const { code } = await requestCode(agent, email);
  const response = await agent.post("/sign-in/verify").type("form").send({ intent: "verify", code });
  if (response.status !== 302 || response.headers.location !== "/") {
    throw new Error(`verify answered ${response.status} to ${response.headers.location}`);
  }
}

export function pathOf(location: string | undefined): string {
  return location ? new URL(location, "http://x").pathname : "";
}
