// hFE against IC on log-log axes, drawn as plain SVG so the server sends the whole chart.
import { useId } from "react";
import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridColumns, GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLog } from "@visx/scale";
import { LinePath } from "@visx/shape";
import { formatQuantity } from "#app/domain/quantity.ts";

export interface GainPlotPoint {
  icAmps: number;
  vceVolts: number | null;
  hfeMin: number | null;
  hfeTyp: number | null;
  hfeMax: number | null;
  tempC: number | null;
}

/** The circuit's operating current and the worst-case hFE the engine reads there. */
export interface GainPlotOperatingPoint {
  icAmps: number;
  hfe: number;
  offPoint: boolean;
}

export const GAIN_SERIES = [
  { key: "hfeMin", name: "min", label: "hFE min", colour: "var(--color-ink)", dash: undefined },
  { key: "hfeTyp", name: "typ", label: "hFE typ", colour: "var(--color-signal)", dash: "6 3" },
  { key: "hfeMax", name: "max", label: "hFE max", colour: "var(--color-caution)", dash: "2 3" },
] as const;

type SeriesKey = (typeof GAIN_SERIES)[number]["key"];

const MARGIN = { top: 16, right: 24, bottom: 44, left: 56 };
const ROOM_TEMP_TOLERANCE_K = 5;

/** Decade bounds around the values (at least one decade wide), and the decades inside them. */
export function decadeDomain(values: number[]): { domain: [number, number]; decades: number[] } {
  const positive = values.filter((v) => v > 0 && Number.isFinite(v));
  const lowExp = positive.length ? Math.floor(Math.log10(Math.min(...positive)) + 1e-9) : 0;
  let highExp = positive.length ? Math.ceil(Math.log10(Math.max(...positive)) - 1e-9) : 1;
  if (highExp <= lowExp) highExp = lowExp + 1;
  const decades: number[] = [];
  for (let e = lowExp; e <= highExp; e += 1) decades.push(10 ** e);
  return { domain: [10 ** lowExp, 10 ** highExp], decades };
}

/** Light lines at 2×..9× inside each decade, the way log paper is ruled. */
function minorTicks(decades: number[]): number[] {
  const ticks: number[] = [];
  for (const decade of decades.slice(0, -1)) {
    for (let m = 2; m <= 9; m += 1) ticks.push(decade * m);
  }
  return ticks;
}

function formatHfe(value: number): string {
  return value >= 1000 ? `${value / 1000}k` : String(value);
}

export function GainPlot({
  points,
  operatingPoint,
  width = 640,
  height = 320,
}: {
  points: GainPlotPoint[];
  operatingPoint?: GainPlotOperatingPoint | null;
  width?: number;
  height?: number;
}) {
  const titleId = useId();
  // Points quoted at other temperatures are listed under the chart, not mixed into the room-temperature curves.
  const room = points.filter((p) => p.tempC == null || Math.abs(p.tempC - 25) <= ROOM_TEMP_TOLERANCE_K);
  const plotted = [...room].sort((a, b) => a.icAmps - b.icAmps);
  const otherTemps = points.length - room.length;
  const hfeValues = plotted.flatMap((p) => [p.hfeMin, p.hfeTyp, p.hfeMax]).filter((v): v is number => v != null && v > 0);
  if (plotted.length === 0 || hfeValues.length === 0) {
    return <p className="text-sm text-ink/70">No gain point at room temperature to plot.</p>;
  }
  const op = operatingPoint && operatingPoint.icAmps > 0 ? operatingPoint : null;
  const x = decadeDomain([...plotted.map((p) => p.icAmps), ...(op ? [op.icAmps] : [])]);
  const y = decadeDomain([...hfeValues, ...(op && op.hfe > 0 ? [op.hfe] : [])]);
  const innerWidth = width - MARGIN.left - MARGIN.right;
  const innerHeight = height - MARGIN.top - MARGIN.bottom;
  const xScale = scaleLog<number>({ domain: x.domain, range: [0, innerWidth] });
  const yScale = scaleLog<number>({ domain: y.domain, range: [innerHeight, 0] });
  const series = GAIN_SERIES.map((s) => ({
    ...s,
    points: plotted
      .map((p) => ({ icAmps: p.icAmps, hfe: p[s.key as SeriesKey] }))
      .filter((p): p is { icAmps: number; hfe: number } => p.hfe != null && p.hfe > 0),
  })).filter((s) => s.points.length > 0);

  const opLabel = op ? `${op.hfe > 0 ? `hFE ≥ ${Math.round(op.hfe)}` : "no hFE"} at ${formatQuantity(op.icAmps, "current")}` : "";
  const opColour = op?.offPoint ? "var(--color-fault)" : "var(--color-signal)";
  const opLabelLeft = op ? xScale(op.icAmps) > innerWidth * 0.6 : false;

  return (
    <figure className="gain-plot">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        role="img"
        aria-labelledby={titleId}
        className="block max-w-full font-sans"
        data-testid="gain-plot"
      >
        <title id={titleId}>hFE against collector current, log axes</title>
        <Group left={MARGIN.left} top={MARGIN.top}>
          <rect width={innerWidth} height={innerHeight} fill="white" />
          <GridColumns scale={xScale} height={innerHeight} tickValues={minorTicks(x.decades)} stroke="var(--color-rule)" strokeOpacity={0.45} />
          <GridRows scale={yScale} width={innerWidth} tickValues={minorTicks(y.decades)} stroke="var(--color-rule)" strokeOpacity={0.45} />
          <GridColumns scale={xScale} height={innerHeight} tickValues={x.decades} stroke="var(--color-rule)" />
          <GridRows scale={yScale} width={innerWidth} tickValues={y.decades} stroke="var(--color-rule)" />
          {series.map((s) => (
            <g key={s.key} data-series={s.name}>
              <LinePath
                data={s.points}
                x={(d) => xScale(d.icAmps)}
                y={(d) => yScale(d.hfe)}
                stroke={s.colour}
                strokeWidth={2}
                strokeDasharray={s.dash}
                fill="none"
              />
              {s.points.map((d) => (
                <circle key={d.icAmps} cx={xScale(d.icAmps)} cy={yScale(d.hfe)} r={3.5} fill="white" stroke={s.colour} strokeWidth={2}>
                  <title>{`${s.label} ${d.hfe} at ${formatQuantity(d.icAmps, "current")}`}</title>
                </circle>
              ))}
            </g>
          ))}
          {op ? (
            <g data-series="operating-point">
              <line x1={xScale(op.icAmps)} x2={xScale(op.icAmps)} y1={0} y2={innerHeight} stroke={opColour} strokeDasharray="4 3" />
              {op.hfe > 0 ? (
                <circle cx={xScale(op.icAmps)} cy={yScale(op.hfe)} r={5} fill={opColour}>
                  <title>{opLabel}</title>
                </circle>
              ) : null}
              <text
                x={xScale(op.icAmps) + (opLabelLeft ? -6 : 6)}
                y={12}
                textAnchor={opLabelLeft ? "end" : "start"}
                fontSize={12}
                fill={opColour}
              >
                {opLabel}
              </text>
            </g>
          ) : null}
          <AxisBottom
            top={innerHeight}
            scale={xScale}
            tickValues={x.decades}
            tickFormat={(v) => formatQuantity(Number(v), "current")}
            stroke="var(--color-ink)"
            tickStroke="var(--color-ink)"
            tickLabelProps={{ fill: "var(--color-ink)", fontSize: 11, textAnchor: "middle", fontFamily: "inherit" }}
            label="IC"
            labelProps={{ fill: "var(--color-ink)", fontSize: 12, textAnchor: "middle", fontFamily: "inherit" }}
          />
          <AxisLeft
            scale={yScale}
            tickValues={y.decades}
            tickFormat={(v) => formatHfe(Number(v))}
            stroke="var(--color-ink)"
            tickStroke="var(--color-ink)"
            tickLabelProps={{ fill: "var(--color-ink)", fontSize: 11, textAnchor: "end", dx: "-0.25em", dy: "0.33em", fontFamily: "inherit" }}
            label="hFE"
            labelOffset={30}
            labelProps={{ fill: "var(--color-ink)", fontSize: 12, textAnchor: "middle", fontFamily: "inherit" }}
          />
        </Group>
      </svg>
      <figcaption className="mt-2 flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-ink/80">
        {series.map((s) => (
          <span key={s.key} className="inline-flex items-center gap-1.5">
            <svg width="22" height="8" aria-hidden="true">
              <line x1="0" x2="22" y1="4" y2="4" stroke={s.colour} strokeWidth="2" strokeDasharray={s.dash} />
            </svg>
            {s.label}
          </span>
        ))}
        {op ? (
          <span className="inline-flex items-center gap-1.5">
            <svg width="10" height="10" aria-hidden="true">
              <circle cx="5" cy="5" r="4" fill={opColour} />
            </svg>
            operating point (worst case)
          </span>
        ) : null}
        {otherTemps > 0 ? <span>{`${otherTemps} point${otherTemps === 1 ? "" : "s"} at other temperatures not plotted`}</span> : null}
      </figcaption>
    </figure>
  );
}
