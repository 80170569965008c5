// Request bodies are refused by their declared size before a byte is read, with an answer the client can read
// (the rest of the body is drained up to a cap instead of resetting the connection).
import type { NextFunction, Request, Response } from "express";
import { MAX_INTAKE_BYTES } from "#app/domain/intake/columns.ts";
import { MULTIPART_SLACK_BYTES, tooLargeMessage } from "#app/lib/upload.server.ts";

/** Forms are small; only intake uploads carry files. */
export const FORM_BODY_LIMIT_BYTES = 1024 * 1024;
const UPLOAD_PATHS = new Set(["/api/intakes", "/intakes/new"]);
/** How much of a refused body is read and thrown away so the client sees the answer; past this the socket closes. */
export const DRAIN_LIMIT_BYTES = 64 * 1024 * 1024;

function isUpload(req: Request): boolean {
  return req.method === "POST" && UPLOAD_PATHS.has(req.path.replace(/\/+$/, "") || "/");
}

function drainThenClose(req: Request): void {
  let drained = 0;
  req.on("data", (chunk: Buffer) => {
    drained += chunk.length;
    if (drained > DRAIN_LIMIT_BYTES) req.destroy();
  });
  req.on("error", () => undefined);
}

function refuse(req: Request, res: Response, status: 411 | 413, code: string, message: string, details: unknown): void {
  drainThenClose(req);
  // No "Connection: close": Node would close the socket under a client still sending, which then sees a reset.
  res.status(status).set({ "Cache-Control": "no-store" });
  if (req.path.startsWith("/api/")) {
    res.json({ error: { code, message, details } });
  } else {
    res.type("text/plain").send(message);
  }
}

export function refuseOversizedBody(req: Request, res: Response, next: NextFunction): void {
  if (req.method === "GET" || req.method === "HEAD") return next();
  const upload = isUpload(req);
  const limit = upload ? MAX_INTAKE_BYTES + MULTIPART_SLACK_BYTES : FORM_BODY_LIMIT_BYTES;
  const declared = req.get("content-length");
  if (declared === undefined) {
    // Uploads may stream (the upload reader counts as it reads); anything else must say how long it is.
    if (upload || req.get("transfer-encoding") === undefined) return next();
    return refuse(req, res, 411, "length-required", "Send this request with a Content-Length header.", null);
  }
  if (Number(declared) <= limit) return next();
  if (upload) return refuse(req, res, 413, "too-large", tooLargeMessage(MAX_INTAKE_BYTES), { maxBytes: MAX_INTAKE_BYTES });
  return refuse(req, res, 413, "too-large", `This request is larger than the ${Math.round(FORM_BODY_LIMIT_BYTES / 1024)} kB a form may send.`, {
    maxBytes: FORM_BODY_LIMIT_BYTES,
  });
}
