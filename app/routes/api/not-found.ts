import type { Route } from "./+types/not-found";
import { apiError } from "#app/lib/api.server.ts";

function notFound(request: Request) {
  const { pathname } = new URL(request.url);
  return apiError(404, "not-found", `No API route at ${pathname}.`);
}

export function loader({ request }: Route.LoaderArgs) {
  return notFound(request);
}

export function action({ request }: Route.ActionArgs) {
  return notFound(request);
}
