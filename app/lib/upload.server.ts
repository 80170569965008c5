// Reads a multipart upload without ever holding more than the allowed size in memory.

/** Room for the multipart envelope (boundaries, part headers, small fields) around the file itself. */
export const MULTIPART_SLACK_BYTES = 64 * 1024;

export type UploadRead =
  | { ok: true; form: FormData }
  | { ok: false; status: 400 | 413; code: "bad-request" | "too-large"; message: string };

/** Past this much of a refused body, the connection is closed instead of drained. */
const DRAIN_LIMIT_BYTES = 64 * 1024 * 1024;

export function tooLargeMessage(limitBytes: number): string {
  const mb = (limitBytes / (1024 * 1024)).toFixed(0);
  return `The file is larger than the ${mb} MB an intake accepts. Split it into smaller files.`;
}

function tooLarge(limitBytes: number): UploadRead {
  return { ok: false, status: 413, code: "too-large", message: tooLargeMessage(limitBytes) };
}

// Reading the rest and throwing it away lets the client finish sending and read the answer; cancelling the
// stream would reset the connection under it.
async function drain(reader: ReadableStreamDefaultReader<Uint8Array>, alreadyRead: number): Promise<void> {
  let total = alreadyRead;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return;
    total += value.byteLength;
    if (total > DRAIN_LIMIT_BYTES) {
      await reader.cancel().catch(() => undefined);
      return;
    }
  }
}

/**
 * The request's multipart form, refused with 413 when the body is larger than the file limit plus the envelope:
 * first by Content-Length, then by counting bytes while reading (a missing or false length is caught too).
 */
export async function readMultipartUpload(request: Request, fileLimitBytes: number): Promise<UploadRead> {
  const bodyLimit = fileLimitBytes + MULTIPART_SLACK_BYTES;
  const declared = Number(request.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > bodyLimit) {
    await request.body?.cancel().catch(() => undefined);
    return tooLarge(fileLimitBytes);
  }
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    await request.body?.cancel().catch(() => undefined);
    return { ok: false, status: 400, code: "bad-request", message: "Send the file as multipart/form-data with the fields kind (parts or offers) and file." };
  }
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = request.body?.getReader();
  if (reader) {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > bodyLimit) {
        chunks.length = 0;
        await drain(reader, total).catch(() => undefined);
        return tooLarge(fileLimitBytes);
      }
      chunks.push(value);
    }
  }
  const body = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    body.set(chunk, offset);
    offset += chunk.byteLength;
  }
  chunks.length = 0;
  try {
    const form = await new Response(body, { headers: { "content-type": contentType } }).formData();
    return { ok: true, form };
  } catch {
    return { ok: false, status: 400, code: "bad-request", message: "The upload is not readable multipart/form-data. Send the fields kind and file again." };
  }
}
