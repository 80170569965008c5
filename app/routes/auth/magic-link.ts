import type { Route } from "./+types/magic-link";
import { authenticateWithCode } from "#app/lib/auth.server.ts";

// The e-mailed link verifies only in the browser that asked for it: the code's state rides in its cookie.
export async function loader({ request }: Route.LoaderArgs) {
  return authenticateWithCode(request);
}
