import { data, Form, redirect } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/verify";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { authenticateWithCode, getOptionalUser, readCodeState } from "#app/lib/auth.server.ts";
import { env } from "#app/lib/env.server.ts";
import { parseForm } from "#app/lib/forms.ts";

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
  const state = readCodeState(request);
  if (!state.email) throw redirect("/sign-in");
  return { email: state.email, canVerify: state.hasCode, error: state.error, mailInboxUrl: env().MAIL_INBOX_URL ?? null };
}

export async function action({ request }: Route.ActionArgs) {
  const form = await parseForm(request, VerifySchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values }, { status: 400 });
  return authenticateWithCode(request);
}

export const meta: Route.MetaFunction = () => [{ title: "Enter your code · Betasift" }];

export default function Verify({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.fieldErrors;
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
