import { data, Form, Link, redirect, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/intake";
import { MissingPartsList, ReadingsTable } from "#app/components/intake/intake-notes.tsx";
import { ChangeList, IntakeCountsBar, ProblemsTable, StateTag, type ProblemFilter, type ProblemSort } from "#app/components/intake/intake-parts.tsx";
import { Notice } from "#app/components/ui/field.tsx";
import { formatBytes, formatWhen } from "#app/components/ui/format.ts";
import { commitIntake, discardIntake, getIntake, getIntakeFile, previewIntake, rollbackIntake } from "#app/data/intakes.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";
import { parseForm } from "#app/lib/forms.ts";

const ParamsSchema = z.object({ intakeId: z.uuid() });
const ViewSchema = z.object({
  severity: z.enum(["all", "error", "warning"]).catch("all"),
  sort: z.enum(["row", "severity", "column"]).catch("row"),
  done: z.enum(["commit", "discard", "rollback"]).optional().catch(undefined),
});
const OperationSchema = z.object({
  intent: z.enum(["commit", "discard", "rollback", "preview-again"], { error: "Unknown action: choose commit, discard, roll back or preview again." }),
});

const DONE_NOTICES = {
  commit: "Committed: the catalogue now holds this intake's rows.",
  discard: "Discarded: nothing was written; the file and its report are kept.",
  rollback: "Rolled back: every part this intake touched is back to its previous revision.",
} as const;

function intakeIdOf(params: Route.LoaderArgs["params"]): string {
  const parsed = ParamsSchema.safeParse(params);
  if (!parsed.success) throw new Response("No intake has that address.", { status: 404 });
  return parsed.data.intakeId;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const intake = await getIntake(intakeIdOf(params));
  if (!intake) throw new Response("No intake has that address.", { status: 404 });
  const view = ViewSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return { intake, view };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, "librarian");
  const id = intakeIdOf(params);
  const form = await parseForm(request, OperationSchema);
  if (!form.ok) return data({ error: form.fieldErrors.intent ?? form.fieldErrors.form ?? "Send the form again." }, { status: 400 });
  if (form.data.intent === "preview-again") {
    // The stored file, compared with the catalogue as it is now, becomes a new preview.
    const intake = await getIntake(id);
    const file = await getIntakeFile(id);
    if (!intake || !file) throw new Response("No intake has that address.", { status: 404 });
    const again = await previewIntake({ kind: intake.kind, fileName: file.fileName, bytes: file.bytes, uploadedBy: user.id });
    return redirect(`/intakes/${again.id}`);
  }
  const result =
    form.data.intent === "commit"
      ? await commitIntake(id, user.id)
      : form.data.intent === "discard"
        ? await discardIntake(id, user.id)
        : await rollbackIntake(id, user.id);
  if (result.ok) return redirect(`/intakes/${id}?done=${form.data.intent}`);
  const status = result.code === "not-found" ? 404 : 409;
  return data({ error: result.message, stale: result.code === "stale" }, { status });
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.intake.fileName ?? "Intake"} · Intakes · Betasift` }];

export default function IntakePage({ loaderData, actionData }: Route.ComponentProps) {
  const { intake, view } = loaderData;
  const navigation = useNavigation();
  const busy = navigation.state !== "idle" && navigation.formMethod === "POST";
  const noun = intake.kind === "parts" ? "part" : "offer";
  return (
    <section className="space-y-6">
      <div>
        <p className="text-sm">
          <Link to="/intakes" className="text-signal underline">Intakes</Link>
        </p>
        <div className="mt-2 flex flex-wrap items-baseline gap-3">
          <h1 className="text-2xl font-semibold">{intake.fileName}</h1>
          <StateTag state={intake.state} />
        </div>
        <p className="mt-1 text-sm text-ink/70">
          {intake.kind} file · {formatBytes(intake.sizeBytes)} · uploaded by {intake.uploadedBy.name} {formatWhen(intake.createdAt)}
          {intake.committedAt ? ` · committed ${formatWhen(intake.committedAt)}` : ""} ·{" "}
          <a href={`/intakes/${intake.id}/file`} className="text-signal underline">
            download the file as uploaded
          </a>
        </p>
      </div>

      {view.done && !actionData ? <Notice tone="info">{DONE_NOTICES[view.done]}</Notice> : null}
      {actionData?.error ? <Notice tone="fault">{actionData.error}</Notice> : null}
      {actionData && "stale" in actionData && actionData.stale ? (
        <Form method="post">
          <input type="hidden" name="intent" value="preview-again" />
          <button type="submit" disabled={busy} className="rounded bg-signal px-4 py-2 font-medium text-white hover:bg-signal/90 disabled:opacity-60">
            Preview the file again
          </button>
        </Form>
      ) : null}

      <IntakeCountsBar counts={intake.counts} />

      {intake.state === "previewed" ? (
        <div className="flex flex-wrap items-center gap-3 rounded border border-rule bg-white px-4 py-3">
          {intake.canCommit ? (
            <Form method="post">
              <input type="hidden" name="intent" value="commit" />
              <button type="submit" disabled={busy} className="rounded bg-signal px-4 py-2 font-medium text-white hover:bg-signal/90 disabled:opacity-60">
                Commit {intake.counts.new + intake.counts.changed} {noun}
                {intake.counts.new + intake.counts.changed === 1 ? "" : "s"}
                {intake.counts.warnings > 0 ? `, accepting ${intake.counts.warnings} warning${intake.counts.warnings === 1 ? "" : "s"}` : ""}
              </button>
            </Form>
          ) : null}
          <Form method="post">
            <input type="hidden" name="intent" value="discard" />
            <button type="submit" disabled={busy} className="rounded border border-rule px-4 py-2 hover:bg-paper disabled:opacity-60">
              Discard
            </button>
          </Form>
          <p className="text-sm text-ink/70">
            {intake.canCommit
              ? intake.counts.rejected > 0
                ? `Commit writes the good rows in one transaction; the ${intake.counts.rejected} rejected row${intake.counts.rejected === 1 ? " is" : "s are"} skipped. Fix ${intake.counts.rejected === 1 ? "it" : "them"} in the file and upload it again to add ${intake.counts.rejected === 1 ? "it" : "them"} later.`
                : "Commit writes every row in one transaction, or nothing."
              : "Nothing here can be committed: fix the problems below in the file and upload it again."}{" "}
            Discard keeps the file and this report.
          </p>
        </div>
      ) : null}

      {intake.state === "committed" ? (
        <details className="rounded border border-rule bg-white px-4 py-3">
          <summary className="cursor-pointer font-medium">Roll back this intake…</summary>
          <Form method="post" className="mt-3 space-y-3">
            <input type="hidden" name="intent" value="rollback" />
            <p className="text-sm">
              Rolling back restores every {noun} this intake touched to its revision before the commit. It is refused when a
              later intake changed the same {noun}s: roll that one back first.
            </p>
            <button type="submit" disabled={busy} className="rounded border border-fault px-4 py-2 text-fault hover:bg-fault-soft disabled:opacity-60">
              Yes, roll back {intake.fileName}
            </button>
          </Form>
        </details>
      ) : null}

      <section id="problems" aria-labelledby="problems-heading">
        <h2 id="problems-heading" className="mb-2 text-lg font-semibold">
          Problems
        </h2>
        {intake.problemsTotal > intake.problems.length ? (
          <p className="mb-2 text-sm text-ink/70">
            Showing the first {intake.problems.length} of {intake.problemsTotal} problems; fix these in the file and upload it again to see the rest.
          </p>
        ) : null}
        <ProblemsTable problems={intake.problems} filter={view.severity as ProblemFilter} sort={view.sort as ProblemSort} />
        {intake.counts.rejected > 0 && !intake.problems.some((p) => p.severity === "error" && (p.row === null || p.row === 1)) ? (
          <p className="mt-2 text-sm">
            <a href={`/intakes/${intake.id}/rejected`} className="text-signal underline">
              Download the {intake.counts.rejected} rejected row{intake.counts.rejected === 1 ? "" : "s"}
            </a>{" "}
            with a problems column, to correct and upload again.
          </p>
        ) : null}
      </section>

      <section aria-labelledby="readings-heading">
        <h2 id="readings-heading" className="mb-2 text-lg font-semibold">
          How cells were read
        </h2>
        <p className="mb-2 text-sm text-ink/70">Cells not taken literally, and what they were read as. Check them before committing.</p>
        <ReadingsTable readings={intake.readings} notListed={intake.readingsNotListed} />
      </section>

      <section aria-labelledby="changes-heading">
        <h2 id="changes-heading" className="mb-2 text-lg font-semibold">
          {intake.state === "previewed" ? "What a commit would change" : "What this intake changed"}
        </h2>
        {intake.changesTotal > intake.changes.length ? (
          <p className="mb-2 text-sm text-ink/70">
            Showing {intake.changes.length} of {intake.changesTotal} accepted rows, changed and new first.
          </p>
        ) : null}
        <MissingPartsList parts={intake.missingParts} total={intake.missingTotal} />
        <ChangeList changes={intake.changes} kind={intake.kind} />
      </section>
    </section>
  );
}
