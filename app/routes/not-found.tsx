import { data } from "react-router";
import type { Route } from "./+types/not-found";

export async function loader({ request }: Route.LoaderArgs) {
  const { pathname } = new URL(request.url);
  return data({ pathname }, { status: 404 });
}

export const meta: Route.MetaFunction = () => [{ title: "Page not found · Betasift" }];

export default function NotFound({ loaderData }: Route.ComponentProps) {
  return (
    <section className="max-w-2xl">
      <h1 className="text-2xl font-semibold">Page not found</h1>
      <p className="mt-3">
        Nothing lives at <code className="rounded bg-white px-1">{loaderData.pathname}</code>. The link may be old, or the
        address mistyped.
      </p>
      <p className="mt-6">
        <a className="text-signal underline" href="/">
          Back to the dashboard
        </a>
      </p>
    </section>
  );
}
