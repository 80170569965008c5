// The drop zone: choose or drop one CSV, pick its kind, upload with a progress bar.
// With JavaScript it posts to /api/intakes through XMLHttpRequest (for upload progress events);
// without it, the same form posts as plain multipart to the page's own action.
import { useEffect, useState, type FormEvent } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { formatBytes } from "#app/components/ui/format.ts";

export type UploadPhase = "idle" | "uploading" | "checking" | "done" | "failed";

export interface UploadState {
  phase: UploadPhase;
  /** 0..1 of the bytes sent. */
  fraction: number;
  error: string | null;
}

const ACCEPT = { "text/csv": [".csv"], "text/plain": [".txt", ".tsv"], "text/tab-separated-values": [".tsv"] };

/** What the page says for an API answer that is not a preview. */
export function uploadErrorMessage(status: number, body: unknown, maxBytes: number): string {
  const message =
    typeof body === "object" && body !== null && "error" in body && typeof (body as { error: { message?: unknown } }).error?.message === "string"
      ? (body as { error: { message: string } }).error.message
      : null;
  if (status === 413) {
    return message ?? `The file is larger than the ${formatBytes(maxBytes)} limit. Split it into smaller files and upload each.`;
  }
  if (status === 401) return "Your session has ended. Sign in again, then upload the file again.";
  if (status === 403) return message ?? "Intakes need the librarian role.";
  if (status === 0) return "The upload did not reach the server. Check the connection and try again.";
  return message ?? `The server answered ${status} and made no preview. Try again; if it keeps happening, tell your admin.`;
}

/** The new intake's id from the API's preview answer. */
export function intakeIdOf(body: unknown): string | null {
  if (typeof body !== "object" || body === null) return null;
  const record = body as { id?: unknown; intake?: { id?: unknown } };
  if (typeof record.id === "string") return record.id;
  if (typeof record.intake?.id === "string") return record.intake.id;
  return null;
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

function describeRejection(rejection: FileRejection, maxBytes: number): string {
  const code = rejection.errors[0]?.code;
  if (code === "file-too-large") return `${rejection.file.name} is ${formatBytes(rejection.file.size)}, over the ${formatBytes(maxBytes)} limit.`;
  if (code === "file-invalid-type") return `${rejection.file.name} is not a CSV or text file. Save the sheet as CSV (comma, semicolon or tab) first.`;
  if (code === "too-many-files") return "Drop one file at a time.";
  return rejection.errors[0]?.message ?? "That file cannot be used.";
}

export function IntakeUpload({
  maxBytes,
  defaultKind = "parts",
  serverError,
  apiPath = "/api/intakes",
  onUploaded,
}: {
  maxBytes: number;
  defaultKind?: "parts" | "offers";
  /** A message from the page's own action (the form posted without JavaScript). */
  serverError?: string | null;
  apiPath?: string;
  onUploaded: (intakeId: string) => void;
}) {
  const [hydrated, setHydrated] = useState(false);
  const [file, setFile] = useState<File | null>(null);
  const [kind, setKind] = useState<"parts" | "offers">(defaultKind);
  const [upload, setUpload] = useState<UploadState>({ phase: "idle", fraction: 0, error: serverError ?? null });
  useEffect(() => setHydrated(true), []);

  const busy = upload.phase === "uploading" || upload.phase === "checking" || upload.phase === "done";
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: ACCEPT,
    multiple: false,
    maxSize: maxBytes,
    disabled: busy,
    onDrop: (accepted, rejected) => {
      if (rejected.length > 0) {
        setFile(null);
        setUpload({ phase: "failed", fraction: 0, error: describeRejection(rejected[0], maxBytes) });
        return;
      }
      setFile(accepted[0] ?? null);
      setUpload({ phase: "idle", fraction: 0, error: null });
    },
  });

  function submit(event: FormEvent<HTMLFormElement>) {
    if (!hydrated) return;
    event.preventDefault();
    if (!file) {
      setUpload({ phase: "failed", fraction: 0, error: "Choose or drop a CSV file first." });
      return;
    }
    const body = new FormData();
    body.set("kind", kind);
    body.set("file", file, file.name);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", apiPath);
    xhr.setRequestHeader("Accept", "application/json");
    xhr.upload.addEventListener("progress", (e) => {
      if (e.lengthComputable) setUpload({ phase: "uploading", fraction: e.loaded / e.total, error: null });
    });
    // Once the last byte is sent the server parses and compares; the bar stays full meanwhile.
    xhr.upload.addEventListener("load", () => setUpload({ phase: "checking", fraction: 1, error: null }));
    xhr.addEventListener("load", () => {
      const answer = parseJson(xhr.responseText);
      const id = xhr.status >= 200 && xhr.status < 300 ? intakeIdOf(answer) : null;
      if (id) {
        setUpload({ phase: "done", fraction: 1, error: null });
        onUploaded(id);
      } else {
        setUpload({ phase: "failed", fraction: 0, error: uploadErrorMessage(xhr.status, answer, maxBytes) });
      }
    });
    xhr.addEventListener("error", () => setUpload({ phase: "failed", fraction: 0, error: uploadErrorMessage(0, null, maxBytes) }));
    setUpload({ phase: "uploading", fraction: 0, error: null });
    xhr.send(body);
  }

  const percent = Math.round(upload.fraction * 100);
  const status =
    upload.phase === "uploading"
      ? `Uploading… ${percent}%`
      : upload.phase === "checking"
        ? "Uploaded. Reading and checking every cell…"
        : upload.phase === "done"
          ? "Preview ready. Opening it…"
          : null;

  return (
    <form method="post" encType="multipart/form-data" onSubmit={submit} className="space-y-5" noValidate>
      <fieldset>
        <legend className="text-sm font-medium">What the file holds</legend>
        <div className="mt-2 flex gap-3">
          {(
            [
              { value: "parts", label: "Parts", hint: "datasheet values, one row per part" },
              { value: "offers", label: "Offers", hint: "stock and price breaks per supplier" },
            ] as const
          ).map((option) => (
            <label
              key={option.value}
              className={`flex flex-1 cursor-pointer items-baseline gap-2 rounded border bg-white px-3 py-2 text-sm ${kind === option.value ? "border-signal ring-1 ring-signal" : "border-rule"}`}
            >
              <input type="radio" name="kind" value={option.value} checked={kind === option.value} onChange={() => setKind(option.value)} />
              <span className="font-medium">{option.label}</span>
              <span className="text-ink/60">{option.hint}</span>
            </label>
          ))}
        </div>
      </fieldset>

      {hydrated ? (
        <div
          {...getRootProps({
            className: `flex min-h-40 cursor-pointer flex-col items-center justify-center rounded border-2 border-dashed px-6 py-8 text-center transition-colors ${
              isDragActive ? "border-signal bg-signal-soft" : "border-rule bg-white hover:border-signal/60"
            } ${busy ? "cursor-wait opacity-70" : ""}`,
          })}
          data-testid="drop-zone"
        >
          <input {...getInputProps({ name: "file" })} data-testid="drop-zone-input" />
          <DropZoneText dragging={isDragActive} maxBytes={maxBytes} />
        </div>
      ) : (
        <label className="flex min-h-40 flex-col items-center justify-center rounded border-2 border-dashed border-rule bg-white px-6 py-8 text-center">
          <DropZoneText dragging={false} maxBytes={maxBytes} />
          <input type="file" name="file" accept=".csv,.txt,.tsv,text/csv,text/plain" className="mt-3 text-sm" />
        </label>
      )}

      {file ? (
        <p className="flex items-baseline gap-2 text-sm" data-testid="chosen-file">
          <span className="text-ink/60">Chosen:</span>
          <span className="font-medium">{file.name}</span>
          <span className="tabular-nums text-ink/60">{formatBytes(file.size)}</span>
        </p>
      ) : null}

      {upload.phase !== "idle" && upload.phase !== "failed" ? (
        <div>
          <div
            role="progressbar"
            aria-label="Upload"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={percent}
            className="h-2 overflow-hidden rounded-full bg-rule/60"
            data-testid="upload-progress"
            data-phase={upload.phase}
          >
            <div className="h-full bg-signal transition-[width] duration-150" style={{ width: `${percent}%` }} />
          </div>
          <p className="mt-1.5 text-sm text-ink/80" aria-live="polite">
            {status}
          </p>
        </div>
      ) : null}

      {upload.error ? (
        <div role="alert" className="rounded border border-fault/30 bg-fault-soft px-4 py-3 text-sm" data-testid="upload-error">
          {upload.error}
        </div>
      ) : null}

      <button
        type="submit"
        disabled={busy}
        className="rounded bg-signal px-4 py-2 font-medium text-white hover:bg-signal/90 disabled:opacity-60"
      >
        Upload and preview
      </button>
      <p className="text-sm text-ink/70">Nothing reaches the catalogue until you look at the preview and commit it.</p>
    </form>
  );
}

function DropZoneText({ dragging, maxBytes }: { dragging: boolean; maxBytes: number }) {
  return (
    <>
      <p className="text-base font-medium">{dragging ? "Drop the file here" : "Drop a CSV file here, or click to choose one"}</p>
      <p className="mt-1 text-sm text-ink/60">
        {`Comma, semicolon or tab separated, UTF-8; up to ${formatBytes(maxBytes)}.`}
      </p>
    </>
  );
}
