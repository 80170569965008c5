import { Form, isRouteErrorResponse, Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/part";
import { GainPlot } from "#app/components/charts/gain-plot.tsx";
import { FlagList, FlagTag } from "#app/components/catalogue/flags.tsx";
import {
  Card,
  DynamicCard,
  GainPointsTable,
  LifecycleCard,
  OffersTable,
  partCaution,
  RatingsCard,
  RevisionHistory,
  SaturationTable,
  ThermalCard,
} from "#app/components/catalogue/part-sections.tsx";
import { Notice } from "#app/components/ui/field.tsx";
import { getPart } from "#app/data/parts.server.ts";
import { DEFAULT_GAIN_WINDOW_DECADES, worstCaseGain } from "#app/domain/gain-curve.ts";
import { formatQuantity, parseQuantity } from "#app/domain/quantity.ts";
import { requireUser } from "#app/lib/auth.server.ts";
import { hasRole } from "#app/lib/roles.ts";

const ParamsSchema = z.object({ partId: z.uuid() });
const NOT_FOUND = "No part in the catalogue has that address. It may have been removed by a rollback, or the link is mistyped.";

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const parsed = ParamsSchema.safeParse(params);
  const detail = parsed.success ? await getPart(parsed.data.partId) : null;
  if (!detail) throw new Response(NOT_FOUND, { status: 404 });
  const searchParams = new URL(request.url).searchParams;
  const icText = searchParams.get("ic")?.trim() ?? "";
  const ic = icText ? parseQuantity(icText, "current") : null;
  const icError = ic && !ic.ok ? `IC: ${ic.reason}` : ic && ic.ok && !(ic.value > 0) ? "IC must be above zero." : null;
  const estimate = ic && ic.ok && ic.value > 0 ? { icAmps: ic.value, ...worstCaseGain(detail.part.gainPoints, ic.value) } : null;
  return {
    detail,
    icText,
    icError,
    operatingPoint: estimate
      ? {
          icAmps: estimate.icAmps,
          hfe: estimate.hfe,
          offPoint: estimate.flags.includes("gain-off-point"),
          noMinGain: estimate.flags.includes("no-min-gain"),
          decadesOffPoint: estimate.decadesOffPoint,
          note: estimate.note,
        }
      : null,
    windowDecades: DEFAULT_GAIN_WINDOW_DECADES,
    canEdit: hasRole(user.roles, ["librarian"]),
    saved: searchParams.get("saved") === "1",
  };
}

export const meta: Route.MetaFunction = ({ data }) => [
  { title: data ? `${data.detail.part.partNumber} · ${data.detail.part.manufacturer} · Betasift` : "Part not found · Betasift" },
];

export default function PartPage({ loaderData }: Route.ComponentProps) {
  const { detail, icText, icError, operatingPoint, windowDecades, canEdit, saved } = loaderData;
  const { part, offers, revisions, dataQuality } = detail;
  const caution = partCaution(part);
  return (
    <article className="space-y-5">
      <div>
        <p className="text-sm">
          <Link to="/catalogue" className="text-signal underline">Catalogue</Link>
        </p>
        <div className="mt-2 flex flex-wrap items-baseline justify-between gap-3">
          <div>
            <h1 className="text-2xl font-semibold">
              {part.partNumber} <span className="font-normal text-ink/60">· {part.manufacturer}</span>
            </h1>
            <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink/80">
              <span className="font-medium">{part.polarity.toUpperCase()}</span>
              <span>{part.packageName}</span>
              <span>{part.configuration === "single" ? "single device" : part.configuration === "darlington" ? "Darlington in one package" : "dual"}</span>
              <span>
                {formatQuantity(part.vceoVolts, "voltage")} · {formatQuantity(part.icMaxAmps, "current")}
              </span>
              {dataQuality.flags.map((flag) => (
                <FlagTag key={flag} flag={flag} />
              ))}
            </p>
          </div>
          {canEdit ? (
            <Link to={`/catalogue/${part.id}/edit`} className="rounded border border-rule bg-white px-3 py-1.5 text-sm hover:border-signal">
              Correct this part
            </Link>
          ) : null}
        </div>
      </div>

      {saved ? <Notice tone="info">Correction saved. The revision history below shows what changed.</Notice> : null}
      {caution ? (
        <div role="note" className="rounded border border-caution/30 bg-caution-soft px-4 py-3 text-sm" data-testid="caution">
          <span className="font-medium text-caution">Caution. </span>
          {caution}
        </div>
      ) : null}

      <Card
        title="Current gain"
        id="gain"
        aside={
          <Form method="get" className="flex items-center gap-2 text-sm">
            <label htmlFor="ic" className="text-ink/70">
              Operating IC
            </label>
            <input
              id="ic"
              name="ic"
              defaultValue={icText}
              placeholder="e.g. 20 mA"
              aria-invalid={icError ? true : undefined}
              className={`w-28 rounded border bg-white px-2 py-1 ${icError ? "border-fault" : "border-rule"}`}
            />
            <button type="submit" className="rounded border border-rule px-2.5 py-1 hover:bg-paper">
              Mark
            </button>
          </Form>
        }
      >
        {icError ? <p className="mb-2 text-sm text-fault">{icError}</p> : null}
        {operatingPoint ? (
          <p className="mb-2 text-sm" data-testid="operating-point">
            Worst-case hFE at {formatQuantity(operatingPoint.icAmps, "current")}:{" "}
            <span className="font-semibold tabular-nums">{operatingPoint.hfe > 0 ? Math.round(operatingPoint.hfe) : "none quoted"}</span>{" "}
            <span className="text-ink/60">({operatingPoint.note})</span>
            {operatingPoint.offPoint ? (
              <span className="mt-1 flex items-baseline gap-2 text-caution">
                <FlagTag flag="gain-off-point" />
                {Number.isFinite(operatingPoint.decadesOffPoint)
                  ? `the operating current lies ${operatingPoint.decadesOffPoint.toFixed(1)} decades outside the quoted points (the window is ${windowDecades} decade); the datasheet does not cover it.`
                  : "no gain is quoted at all."}
              </span>
            ) : null}
          </p>
        ) : null}
        <div className="grid gap-5 lg:grid-cols-[3fr_2fr]">
          <GainPlot points={part.gainPoints} operatingPoint={operatingPoint} />
          <div>
            <GainPointsTable points={part.gainPoints} />
          </div>
        </div>
      </Card>

      <div className="grid gap-5 md:grid-cols-2">
        <RatingsCard part={part} />
        <ThermalCard part={part} />
        <DynamicCard part={part} />
        <LifecycleCard part={part} staleFlag={dataQuality.flags.includes("stale-datasheet")} />
      </div>

      <Card title="Saturation" id="saturation">
        <SaturationTable points={part.saturationPoints} />
      </Card>

      <Card title="Data quality" id="data-quality">
        <FlagList flags={dataQuality.flags} notes={dataQuality.notes} />
      </Card>

      <Card title={`Offers (${offers.length})`} id="offers">
        <OffersTable offers={offers} />
      </Card>

      <Card title="Revision history" id="revisions">
        <RevisionHistory revisions={revisions} />
      </Card>
    </article>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  return (
    <section className="max-w-2xl">
      <h1 className="text-2xl font-semibold">{notFound ? "Part not found" : "This part could not be shown"}</h1>
      <p className="mt-3">{notFound ? NOT_FOUND : "The server could not finish this request. Try again; if it keeps happening, tell your admin."}</p>
      <p className="mt-6">
        <Link to="/catalogue" className="text-signal underline">
          Back to the catalogue
        </Link>
      </p>
    </section>
  );
}
