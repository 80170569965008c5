import { data, Form, redirect, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/sign-in";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { getOptionalUser } from "#app/lib/auth.server.ts";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "#app/lib/db.server.ts";
import { env } from "#app/lib/env.server.ts";
import { EmailSchema, parseForm } from "#app/lib/forms.ts";
import { clientAddressOf } from "#app/lib/load-context.ts";
import { safeRedirectPath, sendSignInCode, VERIFY_PATH } from "#app/lib/sign-in.server.ts";

const SignInSchema = z.object({ email: EmailSchema, redirectTo: z.string().optional() });

export async function loader({ request }: Route.LoaderArgs) {
  if (await getOptionalUser(request)) throw redirect("/");
  const redirectTo = safeRedirectPath(new URL(request.url).searchParams.get("redirectTo"));
  return { mailInboxUrl: env().MAIL_INBOX_URL ?? null, redirectTo };
}

export async function action({ request, context }: Route.ActionArgs) {
  const form = await parseForm(request, SignInSchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values }, { status: 400 });
  try {
    const sent = await sendSignInCode({
      email: form.data.email,
      redirectTo: safeRedirectPath(form.data.redirectTo),
      clientAddress: clientAddressOf(context),
    });
    if (!sent.ok) {
      return data(
        { fieldErrors: { form: sent.message }, values: form.values },
        { status: sent.status, headers: { "Retry-After": String(sent.retryAfterSeconds) } },
      );
    }
    return redirect(VERIFY_PATH, { headers: { "Set-Cookie": sent.setCookie } });
  } catch (error) {
    if (!isDatabaseUnavailable(error)) throw error;
    return data({ fieldErrors: { form: `No code was sent. ${DATABASE_UNAVAILABLE_MESSAGE}` }, values: form.values }, { status: 503 });
  }
}

// Retry-After on a refused code request reaches the browser with the page.
export const headers: Route.HeadersFunction = ({ actionHeaders }) => {
  const retryAfter = actionHeaders.get("Retry-After");
  return retryAfter ? { "Retry-After": retryAfter } : new Headers();
};

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Betasift" }];

export default function SignIn({ loaderData, actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const errors: Record<string, string> | undefined = actionData?.fieldErrors;
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Sign in to Betasift</h1>
      <p className="mt-2 text-ink/80">Type your work e-mail address. We send you a one-time code and a sign-in link.</p>
      <Form method="post" className="mt-6 space-y-4" noValidate>
        {errors?.form ? <Notice tone="fault">{errors.form}</Notice> : null}
        {loaderData.redirectTo ? <input type="hidden" name="redirectTo" value={loaderData.redirectTo} /> : null}
        <TextField
          label="E-mail address"
          name="email"
          type="email"
          autoComplete="email"
          autoFocus
          defaultValue={actionData?.values.email ?? ""}
          error={errors?.email}
        />
        <Button type="submit" disabled={navigation.state === "submitting"}>
          Send me a code
        </Button>
      </Form>
      {loaderData.mailInboxUrl ? (
        <div className="mt-8">
          <Notice tone="info">
            This is a local installation: e-mails go to the local inbox at{" "}
            <a className="font-medium underline" href={loaderData.mailInboxUrl} target="_blank" rel="noreferrer">
              {loaderData.mailInboxUrl}
            </a>
            , where the code can be read.
          </Notice>
        </div>
      ) : null}
    </section>
  );
}
