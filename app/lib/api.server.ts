// The API's one way to answer with an error, and the guard that keeps every answer in that shape:
// `{ error: { code, message, details } }` with the right status, whatever goes wrong.
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "./db.server.ts";

export function apiError(status: number, code: string, message: string, details: unknown = null, headers?: HeadersInit): Response {
  return Response.json({ error: { code, message, details } }, { status, headers });
}

type Handler<A> = (args: A) => Promise<Response>;

/** Wraps a resource route's loader or action: a database outage is a 503 and any other fault a 500, both in JSON. */
export function apiHandler<A>(handler: Handler<A>): Handler<A> {
  return async (args) => {
    try {
      return await handler(args);
    } catch (thrown) {
      if (thrown instanceof Response) throw thrown;
      if (isDatabaseUnavailable(thrown)) {
        return apiError(503, "database-unavailable", DATABASE_UNAVAILABLE_MESSAGE, null, { "Retry-After": "30" });
      }
      console.error(`api: ${thrown instanceof Error ? (thrown.stack ?? thrown.message) : String(thrown)}`);
      return apiError(500, "internal", "The server could not finish this request. Try again; if it keeps happening, tell your admin.");
    }
  };
}

/** The answer for a method a route does not take; `allowed` goes into the Allow header. */
export function methodNotAllowed(allowed: readonly string[]) {
  return async ({ request }: { request: Request }): Promise<Response> =>
    apiError(405, "method-not-allowed", `${request.method} is not allowed here. Use ${allowed.join(" or ")}.`, { allowed }, { Allow: allowed.join(", ") });
}
