import type { Route } from "./+types/not-found";

function notFound(request: Request) {
  const { pathname } = new URL(request.url);
  return Response.json({ error: { code: "not-found", message: `No API route at ${pathname}.`, details: null } }, { status: 404 });
}

export function loader({ request }: Route.LoaderArgs) {
  return notFound(request);
}

export function action({ request }: Route.ActionArgs) {
  return notFound(request);
}
