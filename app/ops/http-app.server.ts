// The HTTP layer in front of React Router, bundled with the app by Vite (the server build's input): security
// headers with a per-response script nonce, the origin check on state-changing requests, upload size refusal
// before a byte is read, static files, and the client's address for rate limits.
import { randomBytes } from "node:crypto";
import path from "node:path";
import { createRequestHandler } from "@react-router/express";
import compression from "compression";
import express, { type NextFunction, type Request, type Response } from "express";
import helmet from "helmet";
import { env } from "#app/lib/env.server.ts";
import { startJobWorkers, stopJobs } from "#app/lib/jobs.server.ts";
import { closeSequelize } from "#db/sequelize.ts";
import { redirectLoopbackAlias, refuseForeignOrigin } from "./origin-check.server.ts";
import { refuseOversizedBody } from "./body-limit.server.ts";

export interface HttpAppOptions {
  /** build/client: the browser bundle. */
  clientDir: string;
  /** public/: files served as they are. */
  publicDir: string;
}

function contentSecurityPolicy() {
  const https = new URL(env().PUBLIC_ORIGIN).protocol === "https:";
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        // React Router's inline hydration scripts carry this response's nonce; nothing else inline runs.
        scriptSrc: ["'self'", (_req, res) => `'nonce-${(res as Response).locals.cspNonce as string}'`],
        styleSrc: ["'self'"],
        // Server-rendered style attributes (bar widths, chart positions) are the only inline styles.
        styleSrcAttr: ["'unsafe-inline'"],
        imgSrc: ["'self'", "data:"],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        baseUri: ["'none'"],
        objectSrc: ["'none'"],
        ...(https ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: https ? { maxAge: 15_552_000 } : false,
    referrerPolicy: { policy: "same-origin" },
    xFrameOptions: { action: "deny" },
    crossOriginEmbedderPolicy: false,
  });
}

export function createHttpApp(options: HttpAppOptions): express.Express {
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", env().TRUST_PROXY);
  app.use((_req, res, next) => {
    res.locals.cspNonce = randomBytes(16).toString("base64");
    next();
  });
  app.use(contentSecurityPolicy());
  app.use(redirectLoopbackAlias);
  app.use(compression());
  app.use("/assets", express.static(path.join(options.clientDir, "assets"), { immutable: true, maxAge: "1y" }));
  app.use(express.static(options.clientDir, { maxAge: "1h" }));
  app.use(express.static(options.publicDir, { maxAge: "1h" }));
  app.use(refuseForeignOrigin);
  app.use(refuseOversizedBody);
  app.all(
    "*",
    createRequestHandler({
      build: () => import("virtual:react-router/server-build"),
      getLoadContext: (req, res) => ({
        clientAddress: req.ip ?? req.socket.remoteAddress ?? "unknown",
        cspNonce: res.locals.cspNonce as string,
      }),
    }),
  );
  // Nothing above should throw; if something does, the answer still has the product's shape.
  app.use((error: unknown, req: Request, res: Response, _next: NextFunction) => {
    console.error(`http: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    if (res.headersSent) return res.end();
    const message = "The server could not finish this request. Try again; if it keeps happening, tell your admin.";
    if (req.path.startsWith("/api/")) return res.status(500).json({ error: { code: "internal", message, details: null } });
    return res.status(500).type("text/plain").send(message);
  });
  return app;
}

/** Work a server process does besides answering requests: the job queue's workers. */
export async function startBackgroundWork(): Promise<void> {
  await startJobWorkers();
}

export async function stopBackgroundWork(): Promise<void> {
  await stopJobs();
  await closeSequelize();
}
