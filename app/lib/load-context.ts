// What the HTTP server (app/ops/http-server.server.ts) hands every loader and action besides the request.
declare module "react-router" {
  interface AppLoadContext {
    /** The client's address as the server saw it (or as trusted proxies reported it). */
    clientAddress?: string;
    /** This response's content-security-policy nonce for inline scripts. */
    cspNonce?: string;
  }
}

/** The client's address; the dev server passes none, so all of its clients share one allowance. */
export function clientAddressOf(context: { clientAddress?: string } | undefined): string {
  return context?.clientAddress || "unknown";
}
