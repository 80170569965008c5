import type { Route } from "./+types/magic-link";
import { databaseUnavailableResponse } from "#app/lib/auth.server.ts";
import { isDatabaseUnavailable } from "#app/lib/db.server.ts";
import { answerVerification } from "#app/lib/sign-in-outcome.server.ts";
import { verifySignIn } from "#app/lib/sign-in.server.ts";

// The e-mailed link verifies only in the browser that asked for it: the challenge id rides in its cookie.
export async function loader({ request }: Route.LoaderArgs) {
  try {
    return await answerVerification(request, await verifySignIn(request, null));
  } catch (error) {
    if (isDatabaseUnavailable(error)) throw databaseUnavailableResponse(request);
    throw error;
  }
}
