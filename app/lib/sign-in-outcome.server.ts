// Turns a checked code or link into the HTTP answer both the verify page and the link route give.
import { redirect } from "react-router";
import { startSession } from "./auth.server.ts";
import { clearChallengeCookie, SIGN_IN_PATH, VERIFY_PATH, type VerifyResult } from "./sign-in.server.ts";

export async function answerVerification(request: Request, result: VerifyResult): Promise<Response> {
  if (result.ok) {
    const headers = new Headers();
    headers.append("Set-Cookie", await startSession(request, result.person));
    headers.append("Set-Cookie", await clearChallengeCookie());
    return redirect(result.redirectTo ?? "/", { headers });
  }
  if (result.error === "no-challenge") return redirect(SIGN_IN_PATH);
  return redirect(VERIFY_PATH);
}
