import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { signOutRedirect } from "#app/lib/auth.server.ts";

export async function loader() {
  return redirect("/");
}

export async function action({ request }: Route.ActionArgs) {
  return signOutRedirect(request);
}
