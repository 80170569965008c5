// The part page's sections: parameters by group, gain and saturation points, offers, revisions.
import type { ReactNode } from "react";
import { Link } from "react-router";
import { BeforeAfter } from "#app/components/intake/intake-parts.tsx";
import { formatCount, formatDay, formatMoney, formatWhen } from "#app/components/ui/format.ts";
import { HAZARDOUS_VOLTS, LARGE_POWER_WATTS } from "#app/domain/hazard-notes.ts";
import { LIFECYCLE_LABELS, type CataloguePart, type GainPoint, type Offer, type SaturationPoint } from "#app/domain/part.ts";
import { formatQuantity, type Dimension } from "#app/domain/quantity.ts";

export function q(value: number | null | undefined, dimension: Dimension): string {
  return value == null ? "—" : formatQuantity(value, dimension);
}

export function Card({ title, id, children, aside }: { title: string; id?: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <section className="rounded border border-rule bg-white" aria-labelledby={id ? `${id}-heading` : undefined} id={id}>
      <div className="flex items-baseline justify-between gap-4 border-b border-rule px-4 py-2.5">
        <h2 id={id ? `${id}-heading` : undefined} className="text-sm font-semibold uppercase tracking-wide text-ink/80">
          {title}
        </h2>
        {aside}
      </div>
      <div className="px-4 py-3">{children}</div>
    </section>
  );
}

interface Parameter {
  symbol: string;
  name: string;
  value: string;
}

function ParameterList({ parameters }: { parameters: Parameter[] }) {
  return (
    <dl className="divide-y divide-rule/60 text-sm">
      {parameters.map((p) => (
        <div key={p.symbol} className="grid grid-cols-[7rem_1fr_auto] items-baseline gap-3 py-1.5">
          <dt className="font-medium">{p.symbol}</dt>
          <dd className="text-ink/60">{p.name}</dd>
          <dd className={`text-right tabular-nums ${p.value === "—" ? "text-ink/40" : ""}`}>{p.value}</dd>
        </div>
      ))}
    </dl>
  );
}

export function ptotText(part: Pick<CataloguePart, "ptotWatts" | "ptotReference">): string {
  if (part.ptotWatts == null) return "—";
  const at = part.ptotReference === "case" ? "case at 25 °C" : part.ptotReference === "ambient" ? "ambient at 25 °C" : "at 25 °C";
  return `${formatQuantity(part.ptotWatts, "power")} (${at})`;
}

export function RatingsCard({ part }: { part: CataloguePart }) {
  return (
    <Card title="Absolute maximum ratings" id="ratings">
      <ParameterList
        parameters={[
          { symbol: "VCEO", name: "collector-emitter, base open", value: q(part.vceoVolts, "voltage") },
          { symbol: "VCBO", name: "collector-base, emitter open", value: q(part.vcboVolts, "voltage") },
          { symbol: "VEBO", name: "emitter-base, collector open", value: q(part.veboVolts, "voltage") },
          { symbol: "IC max", name: "continuous collector current", value: q(part.icMaxAmps, "current") },
          { symbol: "Ptot", name: "total dissipation", value: ptotText(part) },
        ]}
      />
    </Card>
  );
}

export function ThermalCard({ part }: { part: CataloguePart }) {
  return (
    <Card title="Thermal" id="thermal">
      <ParameterList
        parameters={[
          { symbol: "Tj max", name: "junction temperature", value: q(part.tjMaxC, "temperature") },
          { symbol: "Rth(j-a)", name: "junction to ambient", value: q(part.rthJaCPerW, "thermal-resistance") },
          { symbol: "Rth(j-c)", name: "junction to case", value: q(part.rthJcCPerW, "thermal-resistance") },
        ]}
      />
    </Card>
  );
}

export function DynamicCard({ part }: { part: CataloguePart }) {
  return (
    <Card title="Dynamic and small-signal" id="dynamic">
      <ParameterList
        parameters={[
          { symbol: "fT", name: "transition frequency", value: q(part.ftHz, "frequency") },
          { symbol: "Cob", name: "output capacitance", value: q(part.cobFarads, "capacitance") },
          { symbol: "VA", name: "Early voltage", value: q(part.earlyVolts, "voltage") },
          { symbol: "VBE(on)", name: "base-emitter, active", value: q(part.vbeOnVolts, "voltage") },
        ]}
      />
    </Card>
  );
}

export function LifecycleCard({ part, staleFlag }: { part: CataloguePart; staleFlag: boolean }) {
  return (
    <Card title="Lifecycle and datasheet" id="lifecycle">
      <dl className="divide-y divide-rule/60 text-sm">
        <div className="grid grid-cols-[7rem_1fr] gap-3 py-1.5">
          <dt className="font-medium">Lifecycle</dt>
          <dd data-lifecycle={part.lifecycle}>{LIFECYCLE_LABELS[part.lifecycle]}</dd>
        </div>
        <div className="grid grid-cols-[7rem_1fr] gap-3 py-1.5">
          <dt className="font-medium">Datasheet</dt>
          <dd className="truncate">
            {part.datasheetUrl ? (
              <a href={part.datasheetUrl} className="text-signal underline" rel="noreferrer noopener" target="_blank">
                {part.datasheetUrl.replace(/^https?:\/\//, "")}
              </a>
            ) : (
              <span className="text-ink/40">no link</span>
            )}
          </dd>
        </div>
        <div className="grid grid-cols-[7rem_1fr] gap-3 py-1.5">
          <dt className="font-medium">Revision</dt>
          <dd className={staleFlag ? "text-caution" : ""}>
            {part.datasheetRevisionDate ?? <span className="text-ink/40">unknown</span>}
            {staleFlag ? " · stale" : ""}
          </dd>
        </div>
      </dl>
    </Card>
  );
}

const th = "px-3 py-1.5 font-medium";
const num = "px-3 py-1.5 text-right tabular-nums";

export function GainPointsTable({ points }: { points: readonly GainPoint[] }) {
  const sorted = [...points].sort((a, b) => a.icAmps - b.icAmps);
  return (
    <table className="w-full border-collapse text-sm" data-testid="gain-points">
      <thead>
        <tr className="border-b border-rule text-right text-xs uppercase tracking-wide text-ink/60">
          <th scope="col" className={th}>IC</th>
          <th scope="col" className={th}>VCE</th>
          <th scope="col" className={th}>hFE min</th>
          <th scope="col" className={th}>hFE typ</th>
          <th scope="col" className={th}>hFE max</th>
          <th scope="col" className={th}>Temp.</th>
        </tr>
      </thead>
      <tbody>
        {sorted.map((p, i) => (
          <tr key={i} className="border-b border-rule/60 last:border-b-0">
            <td className={num}>{q(p.icAmps, "current")}</td>
            <td className={num}>{q(p.vceVolts, "voltage")}</td>
            <td className={num}>{p.hfeMin ?? <span className="text-ink/40">—</span>}</td>
            <td className={num}>{p.hfeTyp ?? <span className="text-ink/40">—</span>}</td>
            <td className={num}>{p.hfeMax ?? <span className="text-ink/40">—</span>}</td>
            <td className={num}>{p.tempC == null ? "25 °C" : q(p.tempC, "temperature")}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function SaturationTable({ points }: { points: readonly SaturationPoint[] }) {
  if (points.length === 0) return <p className="text-sm text-ink/70">The datasheet values hold no saturation point.</p>;
  const sorted = [...points].sort((a, b) => a.icAmps - b.icAmps);
  return (
    <table className="w-full border-collapse text-sm" data-testid="saturation-points">
      <thead>
        <tr className="border-b border-rule text-right text-xs uppercase tracking-wide text-ink/60">
          <th scope="col" className={th}>IC</th>
          <th scope="col" className={th}>IB</th>
          <th scope="col" className={th}>Forced gain</th>
          <th scope="col" className={th}>VCE(sat) max</th>
          <th scope="col" className={th}>VCE(sat) typ</th>
          <th scope="col" className={th}>VBE(sat)</th>
        </tr>
      </thead>
      <tbody>
        {sorted.map((p, i) => (
          <tr key={i} className="border-b border-rule/60 last:border-b-0">
            <td className={num}>{q(p.icAmps, "current")}</td>
            <td className={num}>{q(p.ibAmps, "current")}</td>
            <td className={num}>{p.ibAmps ? formatQuantity(p.icAmps / p.ibAmps, "ratio") : "—"}</td>
            <td className={num}>{q(p.vceSatMaxVolts, "voltage")}</td>
            <td className={num}>{q(p.vceSatTypVolts, "voltage")}</td>
            <td className={num}>{q(p.vbeSatVolts, "voltage")}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export interface ShownOffer extends Offer {
  id: string;
}

export function OffersTable({ offers }: { offers: readonly ShownOffer[] }) {
  if (offers.length === 0) {
    return <p className="text-sm text-ink/70">No supplier offers yet. A librarian adds them with an offers intake.</p>;
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" data-testid="offers">
        <thead>
          <tr className="border-b border-rule text-xs uppercase tracking-wide text-ink/60">
            <th scope="col" className={`${th} text-left`}>Supplier</th>
            <th scope="col" className={`${th} text-right`}>Stock</th>
            <th scope="col" className={`${th} text-right`}>Min. order</th>
            <th scope="col" className={`${th} text-right`}>Multiple</th>
            <th scope="col" className={`${th} text-right`}>Lead time</th>
            <th scope="col" className={`${th} text-left`}>Price breaks (quantity → unit price)</th>
            <th scope="col" className={`${th} text-right`}>As of</th>
          </tr>
        </thead>
        <tbody>
          {offers.map((o) => (
            <tr key={o.id} className="border-b border-rule/60 align-top last:border-b-0">
              <td className="px-3 py-1.5">
                <span className="font-medium">{o.supplier}</span>
                {o.supplierSku ? <span className="block font-mono text-xs text-ink/60">{o.supplierSku}</span> : null}
              </td>
              <td className={`${num} ${o.stock === 0 ? "text-fault" : ""}`}>{formatCount(o.stock)}</td>
              <td className={num}>{formatCount(o.minimumOrder)}</td>
              <td className={num}>{formatCount(o.orderMultiple)}</td>
              <td className={num}>{o.leadTimeDays == null ? "—" : `${o.leadTimeDays} d`}</td>
              <td className="px-3 py-1.5">
                <table className="border-collapse text-xs">
                  <tbody>
                    {[...o.priceBreaks]
                      .sort((a, b) => a.quantity - b.quantity)
                      .map((b) => (
                        <tr key={b.quantity}>
                          <td className="pr-2 text-right tabular-nums text-ink/70">{formatCount(b.quantity)}+</td>
                          <td className="pr-1 text-ink/40">→</td>
                          <td className="text-right tabular-nums">{formatMoney(b.unitPrice, o.currency)}</td>
                        </tr>
                      ))}
                  </tbody>
                </table>
              </td>
              <td className={`${num} whitespace-nowrap`}>{formatDay(o.asOf)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export interface ShownRevision {
  id: string;
  createdAt: string | Date;
  /** rollback: the values restored when the intake named in `source` was rolled back. */
  action?: "intake" | "rollback" | "edit";
  source: { kind: "intake"; intakeId: string; fileName: string } | { kind: "edit"; editorName: string };
  changes: Array<{ field: string; before: unknown; after: unknown }>;
}

export function RevisionHistory({ revisions }: { revisions: readonly ShownRevision[] }) {
  if (revisions.length === 0) return <p className="text-sm text-ink/70">No revision recorded.</p>;
  return (
    <ol className="space-y-3" data-testid="revisions">
      {revisions.map((r) => (
        <li key={r.id} className="rounded border border-rule/80">
          <div className="flex flex-wrap items-baseline gap-x-3 border-b border-rule/60 bg-paper/50 px-3 py-1.5 text-sm">
            <span className="tabular-nums">{formatWhen(r.createdAt)}</span>
            {r.source.kind === "intake" ? (
              <span>
                {r.action === "rollback" ? "restored by rolling back intake " : "intake "}
                <Link to={`/intakes/${r.source.intakeId}`} className="text-signal underline">
                  {r.source.fileName}
                </Link>
              </span>
            ) : (
              <span>{`corrected by ${r.source.editorName}`}</span>
            )}
            <span className="text-ink/60">{`${r.changes.length} field${r.changes.length === 1 ? "" : "s"}`}</span>
          </div>
          {r.changes.length > 0 && r.changes.every((c) => c.before === null || c.before === undefined) ? (
            <details>
              <summary className="cursor-pointer px-3 py-1.5 text-sm text-signal">{`Created: show the ${r.changes.length} values it was given`}</summary>
              <BeforeAfter fields={r.changes} />
            </details>
          ) : (
            <BeforeAfter fields={r.changes} />
          )}
        </li>
      ))}
    </ol>
  );
}

/** The section 9 caution for parts that can carry hazardous voltage or large power; null otherwise. */
export function partCaution(part: Pick<CataloguePart, "vceoVolts" | "ptotWatts">): string | null {
  const reasons: string[] = [];
  if (part.vceoVolts > HAZARDOUS_VOLTS) {
    reasons.push(`rated ${formatQuantity(part.vceoVolts, "voltage")} VCEO, so circuits built around it can carry hazardous voltage (above ${HAZARDOUS_VOLTS} V)`);
  }
  if (part.ptotWatts != null && part.ptotWatts > LARGE_POWER_WATTS) {
    reasons.push(`rated ${formatQuantity(part.ptotWatts, "power")} Ptot, so the heatsink and its mounting matter`);
  }
  if (reasons.length === 0) return null;
  return `This part is ${reasons.join(", and ")}. Betasift is a screening aid: the manufacturer's datasheet and its safe operating area govern, and local electrical codes and licensed practice come first.`;
}
