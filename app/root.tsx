import { isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration, useRouteLoaderData } from "react-router";
import type { Route } from "./+types/root";
import { AppHeader } from "./components/app-header";
import { useNonce } from "./components/nonce";
import { getOptionalUser } from "./lib/auth.server";
import "./app.css";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getOptionalUser(request);
  return { user: user ? { displayName: user.displayName, email: user.email, roles: user.roles } : null };
}

export const links: Route.LinksFunction = () => [{ rel: "icon", href: "/favicon.svg", type: "image/svg+xml" }];

export function Layout({ children }: { children: React.ReactNode }) {
  const rootData = useRouteLoaderData<typeof loader>("root");
  const nonce = useNonce();
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <Meta />
        {/* Stylesheets need no nonce (style-src 'self'); an empty one renders the same on server and client. */}
        <Links nonce="" />
      </head>
      <body className="min-h-screen font-sans antialiased">
        <AppHeader user={rootData?.user ?? null} />
        <main className="mx-auto max-w-6xl px-4 py-6 sm:px-6 sm:py-8">{children}</main>
        <ScrollRestoration nonce={nonce} />
        <Scripts nonce={nonce} />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  let title = "Something went wrong";
  let detail = "The server could not finish this request. Try again; if it keeps happening, tell your admin.";
  let stack: string | undefined;
  if (isRouteErrorResponse(error)) {
    title =
      error.status === 404 ? "Page not found" : error.status === 403 ? "Not allowed" : error.status === 503 ? "Betasift is out of reach for a moment" : `Error ${error.status}`;
    detail = typeof error.data === "string" && error.data ? error.data : error.statusText || detail;
  } else if (import.meta.env.DEV && error instanceof Error) {
    detail = error.message;
    stack = error.stack;
  }
  return (
    <section className="max-w-2xl">
      {/* React puts this in the head: an error page has a title of its own too. */}
      <title>{`${title} · Betasift`}</title>
      <h1 className="text-2xl font-semibold">{title}</h1>
      <p className="mt-3 text-base">{detail}</p>
      {stack ? <pre className="mt-4 overflow-x-auto rounded bg-white p-4 text-xs">{stack}</pre> : null}
      <p className="mt-6">
        <a className="text-signal underline" href="/">
          Back to the dashboard
        </a>
      </p>
    </section>
  );
}
