import { Link } from "react-router";
import type { Route } from "./+types/dashboard";
import { requireUser } from "#app/lib/auth.server.ts";
import { NEXT_STEPS } from "#app/lib/navigation.ts";
import { ROLE_LABELS } from "#app/lib/roles.ts";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const steps = NEXT_STEPS.filter((step) => user.roles.includes(step.role));
  return { displayName: user.displayName, teamName: user.teamName, roles: user.roles, steps };
}

export const meta: Route.MetaFunction = () => [{ title: "Dashboard · Betasift" }];

export default function Dashboard({ loaderData }: Route.ComponentProps) {
  const { displayName, teamName, roles, steps } = loaderData;
  return (
    <section>
      <h1 className="text-2xl font-semibold">Hello, {displayName.split(" ")[0]}</h1>
      <p className="mt-1 text-ink/70">
        {teamName ? `${teamName} · ` : ""}
        {roles.length ? `Signed in as ${roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(", ")}` : "No role yet: ask an admin to give you one."}
      </p>
      <ul className="mt-8 grid gap-4 md:grid-cols-2">
        {steps.map((step) => (
          <li key={step.role} className="rounded-lg border border-rule bg-white p-5">
            <p className="text-xs font-medium uppercase tracking-wide text-signal">{ROLE_LABELS[step.role]}</p>
            <h2 className="mt-1 text-lg font-semibold">{step.title}</h2>
            <p className="mt-2 text-sm text-ink/80">{step.text}</p>
            {step.link ? (
              <Link to={step.link.path} className="mt-4 inline-block rounded bg-signal px-3 py-1.5 text-sm font-medium text-white">
                {step.link.label}
              </Link>
            ) : (
              <p className="mt-4 text-sm text-ink/60">Not open yet in this installation.</p>
            )}
          </li>
        ))}
      </ul>
      <p className="mt-10 text-sm text-ink/70">
        How Betasift shows verdicts, findings and values:{" "}
        <Link to="/design" className="text-signal underline">
          the design language
        </Link>
        .
      </p>
    </section>
  );
}
