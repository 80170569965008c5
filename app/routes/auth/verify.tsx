import { data, Form, redirect } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/verify";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { databaseUnavailableResponse, getOptionalUser } from "#app/lib/auth.server.ts";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "#app/lib/db.server.ts";
import { env } from "#app/lib/env.server.ts";
import { parseForm } from "#app/lib/forms.ts";
import { clientAddressOf } from "#app/lib/load-context.ts";
import { answerVerification } from "#app/lib/sign-in-outcome.server.ts";
import {
  challengeIsOpen,
  clearChallengeCookie,
  currentChallenge,
  sendSignInCode,
  SIGN_IN_MESSAGES,
  SIGN_IN_PATH,
  VERIFY_PATH,
  verifySignIn,
} from "#app/lib/sign-in.server.ts";

const VerifySchema = z.discriminatedUnion("intent", [
  z.object({
    intent: z.literal("verify"),
    code: z
      .string()
      .trim()
      .min(1, "Type the code from the e-mail.")
      .regex(/^\d+$/, "The code is made of digits only.")
      .length(6, "The code has 6 digits."),
  }),
  z.object({ intent: z.literal("resend") }),
]);

export async function loader({ request }: Route.LoaderArgs) {
  if (await getOptionalUser(request)) throw redirect("/");
  const current = await currentChallenge(request).catch((error: unknown) => {
    if (isDatabaseUnavailable(error)) throw databaseUnavailableResponse(request);
    throw error;
  });
  if (!current) throw redirect(SIGN_IN_PATH, { headers: { "Set-Cookie": await clearChallengeCookie() } });
  const { challenge } = current;
  return {
    email: challenge.email,
    canVerify: challengeIsOpen(challenge),
    error: challenge.lastError ? SIGN_IN_MESSAGES[challenge.lastError] : null,
    mailInboxUrl: env().MAIL_INBOX_URL ?? null,
  };
}

async function resend(request: Request, clientAddress: string) {
  const current = await currentChallenge(request);
  if (!current) return redirect(SIGN_IN_PATH);
  const sent = await sendSignInCode({ email: current.challenge.email, redirectTo: current.challenge.redirectTo, clientAddress });
  if (!sent.ok) {
    return data({ fieldErrors: { form: sent.message }, values: {} as Record<string, string> }, { status: sent.status, headers: { "Retry-After": String(sent.retryAfterSeconds) } });
  }
  return redirect(VERIFY_PATH, { headers: { "Set-Cookie": sent.setCookie } });
}

export async function action({ request, context }: Route.ActionArgs) {
  const form = await parseForm(request, VerifySchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values }, { status: 400 });
  try {
    if (form.data.intent === "resend") return await resend(request, clientAddressOf(context));
    return await answerVerification(request, await verifySignIn(request, form.data.code));
  } catch (error) {
    if (!isDatabaseUnavailable(error)) throw error;
    return data({ fieldErrors: { form: DATABASE_UNAVAILABLE_MESSAGE }, values: form.values }, { status: 503 });
  }
}

// Retry-After on a refused code request reaches the browser with the page.
export const headers: Route.HeadersFunction = ({ actionHeaders }) => {
  const retryAfter = actionHeaders.get("Retry-After");
  return retryAfter ? { "Retry-After": retryAfter } : new Headers();
};

export const meta: Route.MetaFunction = () => [{ title: "Enter your code · Betasift" }];

export default function Verify({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.fieldErrors as Record<string, string> | undefined;
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Enter your code</h1>
      <p className="mt-2 text-ink/80">
        If <strong>{loaderData.email}</strong> has a Betasift account, a 6-digit code and a sign-in link are on their way.
        Open the link in this browser, or type the code here.
      </p>
      {loaderData.error ? (
        <div className="mt-4">
          <Notice tone="fault">{loaderData.error}</Notice>
        </div>
      ) : null}
      {errors?.form ? (
        <div className="mt-4">
          <Notice tone="fault">{errors.form}</Notice>
        </div>
      ) : null}
      {loaderData.canVerify ? (
        <Form method="post" className="mt-6 space-y-4" noValidate>
          <input type="hidden" name="intent" value="verify" />
          <TextField
            label="Code"
            name="code"
            inputMode="numeric"
            autoComplete="one-time-code"
            autoFocus
            maxLength={6}
            defaultValue={actionData?.values.code ?? ""}
            error={errors?.code}
          />
          <Button type="submit">Sign in</Button>
        </Form>
      ) : null}
      <Form method="post" className="mt-6">
        <input type="hidden" name="intent" value="resend" />
        <button type="submit" className="text-signal underline">
          Send a new code
        </button>
        <span className="mx-2 text-ink/50">·</span>
        <a href="/sign-in" className="text-signal underline">
          Use another address
        </a>
      </Form>
      {loaderData.mailInboxUrl ? (
        <p className="mt-8 text-sm text-ink/70">
          Local installation: read the e-mail at{" "}
          <a className="underline" href={loaderData.mailInboxUrl} target="_blank" rel="noreferrer">
            {loaderData.mailInboxUrl}
          </a>
          .
        </p>
      ) : null}
    </section>
  );
}
