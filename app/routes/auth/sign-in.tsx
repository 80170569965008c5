import { data, Form, redirect, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/sign-in";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { authenticateWithCode, getOptionalUser } from "#app/lib/auth.server.ts";
import { env } from "#app/lib/env.server.ts";
import { EmailSchema, parseForm } from "#app/lib/forms.ts";

const SignInSchema = z.object({ email: EmailSchema });

export async function loader({ request }: Route.LoaderArgs) {
  if (await getOptionalUser(request)) throw redirect("/");
  return { mailInboxUrl: env().MAIL_INBOX_URL ?? null };
}

export async function action({ request }: Route.ActionArgs) {
  const form = await parseForm(request, SignInSchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values }, { status: 400 });
  return authenticateWithCode(request);
}

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Betasift" }];

export default function SignIn({ loaderData, actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const errors = actionData?.fieldErrors;
  return (
    <section className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Sign in to Betasift</h1>
      <p className="mt-2 text-ink/80">Type your work e-mail address. We send you a one-time code and a sign-in link.</p>
      <Form method="post" className="mt-6 space-y-4" noValidate>
        {errors?.form ? <Notice tone="fault">{errors.form}</Notice> : null}
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
