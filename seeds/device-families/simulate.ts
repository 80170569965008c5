// Reads a family's datasheet figures off its invented models with ngspice in batch mode (`ngspice -b`).
// Per family: one run sweeps the typical devices (gain, VBE, Early slope, saturation); for families sold in gain groups,
// two runs sweep each group's centre device (a first guess and one correction); one run measures fT and Cob with AC
// analyses biased from the first run's readings.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { Polarity } from "#app/domain/part.ts";
import { parseWrdata, requireNgspice, type Vectors } from "#tests/reference/ngspice.ts";
import type { DeviceFamily, DeviceRef } from "./family.ts";

export const FAMILIES_DIR = fileURLToPath(new URL("./", import.meta.url));

export const libraryPath = (family: DeviceFamily) => join(FAMILIES_DIR, `${family.id}.lib`);

/** Simulations run at 25 °C with the model parameters referred to 25 °C, as datasheet tables are. */
const AT_25_C = [".options tnom=25", ".temp 25"];
/** Gain sweeps step |VBE| by 0.5 mV from 0.2 V: IC moves about 2% a step, read between steps in log(IC). */
const VBE_STEP_VOLTS = 0.0005;
const VBE_START_VOLTS = 0.2;
/** The saturation sweep walks the forced base and collector currents up from 0.1% of the quoted point. */
const SAT_STEPS = 1000;
const COB_TEST_HZ = 1e6;
/** fT is found on a logarithmic AC sweep, 40 points a decade from 10 kHz to 3 GHz, interpolated in log-log. */
const FT_POINTS_PER_DECADE = 40;
const FT_SWEEP_HZ = [1e4, 3e9] as const;

export interface SweepPoint {
  hfe: number;
  vbeVolts: number;
  icAmps: number;
}

export interface DeviceReadings {
  /** hFE of the typical device at each gain condition. */
  gain: number[];
  vbeOnVolts: number;
  saturation: Array<{ vceSatVolts: number; vbeSatVolts: number }>;
  ftHz: number;
  cobFarads: number;
  earlyVolts: number;
  /** Per gain group: the BF factor of the group's centre device and its hFE at each gain condition. */
  groups: Record<string, { bfFactor: number; gain: number[] }>;
}

export type FamilyReadings = Partial<Record<Polarity, DeviceReadings>>;

const sign = (polarity: Polarity) => (polarity === "npn" ? 1 : -1);
const tag = (polarity: Polarity) => (polarity === "npn" ? "n" : "p");

/** The element line that places a device: a transistor for a model card, an X line for a Darlington subcircuit. */
function placeDevice(name: string, device: DeviceRef, collector: string, base: string, emitter: string): string {
  return device.kind === "model" ? `Q${name} ${collector} ${base} ${emitter} ${device.name}` : `X${name} ${collector} ${base} ${emitter} ${device.name}`;
}

/** Every VCE a gain, VBE(on), fT or Early reading needs a sweep at, in first-use order. */
export function listSweepVoltages(family: DeviceFamily): number[] {
  const wanted = [
    ...family.gain.map((g) => g.vceVolts),
    family.vbeOn.vceVolts,
    family.ft.vceVolts,
    family.early.vceVolts,
    family.early.vceVolts + 1,
  ];
  return [...new Set(wanted)];
}

/** Runs one netlist; returns each output file's vectors by the name given in `outputs`. */
function runNgspice(title: string, lines: string[], control: (out: (name: string) => string) => string[], outputs: string[]): Record<string, Vectors> {
  const folder = mkdtempSync(join(tmpdir(), "betasift-families-"));
  try {
    const out = (name: string) => join(folder, `${name}.txt`);
    const netlist = [title, ...lines, ".control", "set wr_singlescale", "set wr_vecnames", ...control(out), "quit 0", ".endc", ".end", ""].join("\n");
    const netlistPath = join(folder, "circuit.cir");
    writeFileSync(netlistPath, netlist);
    try {
      execFileSync("ngspice", ["-b", netlistPath], { cwd: folder, encoding: "utf8", stdio: ["ignore", "pipe", "pipe"] });
    } catch (error) {
      const failure = error as { stdout?: string; stderr?: string };
      throw new Error(`ngspice failed on ${title}:\n${failure.stdout ?? ""}\n${failure.stderr ?? ""}\n${netlist}`);
    }
    return Object.fromEntries(outputs.map((name) => [name, parseWrdata(readFileSync(out(name), "utf8"))]));
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

interface GainSweep {
  vbeVolts: number[];
  icAmps: number[];
  ibAmps: number[];
}

function sweepOf(vectors: Vectors, polarity: Polarity, device: string): GainSweep {
  const s = sign(polarity);
  return {
    vbeVolts: vectors.scale,
    icAmps: vectors[`i(vc${device})`].map((i) => s * i),
    ibAmps: vectors[`i(vb${device})`].map((i) => s * i),
  };
}

/** hFE and VBE where the sweep passes IC, interpolated linearly in log(IC) between the two samples around it. */
export function readAtCurrent(sweep: GainSweep, icAmps: number): SweepPoint {
  const { icAmps: ic, ibAmps: ib, vbeVolts: vbe } = sweep;
  for (let k = 1; k < ic.length; k += 1) {
    if (ic[k - 1] > 0 && ic[k - 1] <= icAmps && icAmps <= ic[k]) {
      const t = (Math.log(icAmps) - Math.log(ic[k - 1])) / (Math.log(ic[k]) - Math.log(ic[k - 1]));
      const hfeA = ic[k - 1] / ib[k - 1];
      const hfeB = ic[k] / ib[k];
      return {
        hfe: Math.exp(Math.log(hfeA) + t * (Math.log(hfeB) - Math.log(hfeA))),
        vbeVolts: vbe[k - 1] + t * (vbe[k] - vbe[k - 1]),
        icAmps,
      };
    }
  }
  throw new RangeError(`IC ${icAmps} A lies outside the simulated sweep (${ic[0]} .. ${ic[ic.length - 1]} A)`);
}

/** IC at a given VBE, interpolated in log(IC). */
function currentAtVbe(sweep: GainSweep, vbeVolts: number): number {
  const { icAmps: ic, vbeVolts: vbe } = sweep;
  const k = vbe.findIndex((v) => v >= vbeVolts);
  if (k < 1) throw new RangeError(`VBE ${vbeVolts} V lies outside the sweep`);
  const t = (vbeVolts - vbe[k - 1]) / (vbe[k] - vbe[k - 1]);
  return Math.exp(Math.log(ic[k - 1]) + t * (Math.log(ic[k]) - Math.log(ic[k - 1])));
}

/** The family's model card with BF scaled: the centre device of one gain group. */
export function scaledModelCard(libraryText: string, modelName: string, newName: string, bfFactor: number): string {
  const joined = libraryText.replace(/\r?\n\+/g, " ");
  const card = joined.split(/\r?\n/).find((line) => new RegExp(`^\\.model\\s+${modelName}\\s`, "i").test(line));
  if (!card) throw new Error(`no .model ${modelName} in the family library`);
  const bf = card.match(/\bBF\s*=\s*([0-9.eE+-]+)/i);
  if (!bf) throw new Error(`model ${modelName} sets no BF`);
  const scaled = Number((Number(bf[1]) * bfFactor).toPrecision(6));
  return card.replace(new RegExp(`^\\.model\\s+${modelName}`, "i"), `.model ${newName}`).replace(bf[0], `BF=${scaled}`);
}

function polaritiesOf(family: DeviceFamily): Polarity[] {
  return (["npn", "pnp"] as const).filter((p) => family.devices[p]);
}

/** The typical devices of both polarities, swept together: PNP nodes mirror the NPN ones through unity VCVSs. */
function runTypical(family: DeviceFamily) {
  const voltages = listSweepVoltages(family);
  const lines = [...AT_25_C, `.include ${libraryPath(family)}`, "VB b 0 0", "VC c 0 1", "EBM bm 0 b 0 -1", "ECM cm 0 c 0 -1", "IT 0 t 0", "VT t 0 0"];
  for (const polarity of polaritiesOf(family)) {
    const device = family.devices[polarity]!;
    const p = tag(polarity);
    const [base, collector] = polarity === "npn" ? ["b", "c"] : ["bm", "cm"];
    lines.push(`VC${p} ${collector} c${p} 0`, `VB${p} ${base} b${p} 0`, placeDevice(p, device, `c${p}`, `b${p}`, "0"));
    family.saturation.forEach((sat, k) => {
      const id = `${p}${k}`;
      // Base and collector currents forced into (NPN) or drawn out of (PNP) the device, both proportional to the swept IT.
      const forced = (element: string, node: string, amps: number) =>
        polarity === "npn" ? `${element} 0 ${node} VT ${amps}` : `${element} ${node} 0 VT ${amps}`;
      lines.push(forced(`FSB${id}`, `sb${id}`, sat.icAmps / sat.forcedGain), forced(`FSC${id}`, `sc${id}`, sat.icAmps));
      lines.push(placeDevice(`S${id}`, device, `sc${id}`, `sb${id}`, "0"));
    });
  }
  const outputs = [...voltages.map((_, k) => `dc${k}`), "sat"];
  const probes = polaritiesOf(family).flatMap((polarity) => [`i(VC${tag(polarity)})`, `i(VB${tag(polarity)})`]);
  const satProbes = polaritiesOf(family).flatMap((polarity) =>
    family.saturation.flatMap((_, k) => [`v(sc${tag(polarity)}${k})`, `v(sb${tag(polarity)}${k})`]),
  );
  const vectors = runNgspice(
    `${family.id}: typical devices`,
    lines,
    (out) => [
      ...voltages.flatMap((vce, k) => [`alter VC dc = ${vce}`, `dc VB ${VBE_START_VOLTS} ${family.vbeSweepMaxVolts} ${VBE_STEP_VOLTS}`, `wrdata ${out(`dc${k}`)} ${probes.join(" ")}`]),
      ...(family.saturation.length > 0 ? [`dc IT ${1 / SAT_STEPS} 1 ${1 / SAT_STEPS}`, `wrdata ${out("sat")} ${satProbes.join(" ")}`] : ["op", `wrdata ${out("sat")} v(t)`]),
    ],
    outputs,
  );
  return { voltages, vectors };
}

/** The typical devices' gain, VBE(on), VCE(sat), VBE(sat) and Early voltage, and the VBE that biases them for fT. */
function readTypical(family: DeviceFamily) {
  const { voltages, vectors } = runTypical(family);
  const sweepAt = (polarity: Polarity, vce: number) => sweepOf(vectors[`dc${voltages.indexOf(vce)}`], polarity, tag(polarity));
  const readings: Partial<Record<Polarity, Omit<DeviceReadings, "ftHz" | "cobFarads" | "groups"> & { ftBiasVolts: number }>> = {};
  for (const polarity of polaritiesOf(family)) {
    const s = sign(polarity);
    const gain = family.gain.map((g) => readAtCurrent(sweepAt(polarity, g.vceVolts), g.icAmps).hfe);
    const vbeOnVolts = readAtCurrent(sweepAt(polarity, family.vbeOn.vceVolts), family.vbeOn.icAmps).vbeVolts;
    const ftBiasVolts = readAtCurrent(sweepAt(polarity, family.ft.vceVolts), family.ft.icAmps).vbeVolts;
    // Early voltage from the output slope at fixed VBE: IC(V + 1) / IC(V) = (VA + V + 1) / (VA + V).
    const atEarly = readAtCurrent(sweepAt(polarity, family.early.vceVolts), family.early.icAmps);
    const icHigher = currentAtVbe(sweepAt(polarity, family.early.vceVolts + 1), atEarly.vbeVolts);
    const earlyVolts = 1 / (icHigher / family.early.icAmps - 1) - family.early.vceVolts;
    const sat = vectors.sat;
    const last = (name: string) => s * sat[name][sat[name].length - 1];
    const saturation = family.saturation.map((_, k) => ({
      vceSatVolts: last(`v(sc${tag(polarity)}${k})`),
      vbeSatVolts: last(`v(sb${tag(polarity)}${k})`),
    }));
    readings[polarity] = { gain, vbeOnVolts, saturation, earlyVolts, ftBiasVolts };
  }
  return readings;
}

/** Groups each polarity's parts use. */
function groupsUsed(family: DeviceFamily, polarity: Polarity): string[] {
  return [...new Set(family.parts.filter((p) => p.polarity === polarity && p.group).map((p) => p.group!))].sort();
}

interface GroupDevice {
  polarity: Polarity;
  group: string;
  id: string;
  bfFactor: number;
}

/** Sweeps each gain group's device (the family model with BF scaled) at the gain conditions' VCEs. */
function runGroups(family: DeviceFamily, devices: GroupDevice[]): number[][] {
  const library = readFileSync(libraryPath(family), "utf8");
  const gainVoltages = [...new Set(family.gain.map((g) => g.vceVolts))];
  const lines = [...AT_25_C, `.include ${libraryPath(family)}`, "VB b 0 0", "VC c 0 1", "EBM bm 0 b 0 -1", "ECM cm 0 c 0 -1"];
  for (const d of devices) {
    const device = family.devices[d.polarity]!;
    if (device.kind !== "model") throw new Error(`${family.id}: gain groups need a model card, not a subcircuit`);
    const [base, collector] = d.polarity === "npn" ? ["b", "c"] : ["bm", "cm"];
    lines.push(scaledModelCard(library, device.name, `${device.name}_${d.id}`, d.bfFactor));
    lines.push(`VC${d.id} ${collector} c${d.id} 0`, `VB${d.id} ${base} b${d.id} 0`, `Q${d.id} c${d.id} b${d.id} 0 ${device.name}_${d.id}`);
  }
  const probes = devices.flatMap((d) => [`i(VC${d.id})`, `i(VB${d.id})`]);
  const vectors = runNgspice(
    `${family.id}: gain groups`,
    lines,
    (out) =>
      gainVoltages.flatMap((vce, k) => [
        `alter VC dc = ${vce}`,
        `dc VB ${VBE_START_VOLTS} ${family.vbeSweepMaxVolts} ${VBE_STEP_VOLTS}`,
        `wrdata ${out(`dc${k}`)} ${probes.join(" ")}`,
      ]),
    gainVoltages.map((_, k) => `dc${k}`),
  );
  return devices.map((d) =>
    family.gain.map((g) => readAtCurrent(sweepOf(vectors[`dc${gainVoltages.indexOf(g.vceVolts)}`], d.polarity, d.id), g.icAmps).hfe),
  );
}

/**
 * Each gain group's centre device: the family model with BF scaled so that hFE at the main condition lands on the
 * group's geometric centre. hFE is nearly proportional to BF there, so the first factor is the centre over the
 * typical hFE; one correction by the same proportion absorbs the rest (recombination at low current, roll-off at high).
 */
function simulateGroups(family: DeviceFamily, typicalMainHfe: Partial<Record<Polarity, number>>): Array<GroupDevice & { gain: number[] }> {
  const centre = (group: string) => Math.sqrt(family.gainGroups![group][0] * family.gainGroups![group][1]);
  const fourDigits = (value: number) => Number(value.toPrecision(4));
  let devices: GroupDevice[] = polaritiesOf(family).flatMap((polarity) =>
    groupsUsed(family, polarity).map((group) => ({
      polarity,
      group,
      id: `g${tag(polarity)}${group.toLowerCase()}`,
      bfFactor: fourDigits(centre(group) / typicalMainHfe[polarity]!),
    })),
  );
  if (devices.length === 0) return [];
  const first = runGroups(family, devices);
  devices = devices.map((d, k) => ({ ...d, bfFactor: fourDigits((d.bfFactor * centre(d.group)) / first[k][family.mainGain]) }));
  const gains = runGroups(family, devices);
  return devices.map((d, k) => ({ ...d, gain: gains[k] }));
}

/** fT (where |h21e| falls to 1, collector held at VCE) and Cob (1 MHz, emitter open) of the typical devices. */
function runSmallSignal(family: DeviceFamily, ftBiasVolts: Partial<Record<Polarity, number>>) {
  const lines = [...AT_25_C, `.include ${libraryPath(family)}`];
  for (const polarity of polaritiesOf(family)) {
    const device = family.devices[polarity]!;
    const p = tag(polarity);
    const s = sign(polarity);
    lines.push(`VFB${p} fb${p} 0 dc ${s * ftBiasVolts[polarity]!} ac 1`, `VFC${p} fc${p} 0 dc ${s * family.ft.vceVolts}`);
    lines.push(`VFBM${p} fb${p} fbi${p} 0`, `VFCM${p} fc${p} fci${p} 0`, placeDevice(`F${p}`, device, `fci${p}`, `fbi${p}`, "0"));
    // Cob: collector-base reverse biased, base at AC ground, emitter left open through 1 GΩ.
    lines.push(`VOB${p} ob${p} 0 dc ${s * family.cob.vcbVolts} ac 1`, `VOBM${p} ob${p} obi${p} 0`);
    lines.push(placeDevice(`O${p}`, device, `obi${p}`, "0", `oe${p}`), `ROE${p} oe${p} 0 1G`);
  }
  const names = polaritiesOf(family).map(tag);
  const vectors = runNgspice(
    `${family.id}: fT and Cob`,
    lines,
    (out) => [
      `ac dec ${FT_POINTS_PER_DECADE} ${FT_SWEEP_HZ[0]} ${FT_SWEEP_HZ[1]}`,
      ...names.map((p) => `let h21${p} = mag(i(VFCM${p})) / mag(i(VFBM${p}))`),
      `wrdata ${out("ft")} ${names.map((p) => `h21${p}`).join(" ")}`,
      `ac lin 1 ${COB_TEST_HZ} ${COB_TEST_HZ}`,
      ...names.map((p) => `let cob${p} = abs(imag(i(VOBM${p}))) / (2 * pi * ${COB_TEST_HZ})`),
      `wrdata ${out("cob")} ${names.map((p) => `cob${p}`).join(" ")}`,
    ],
    ["ft", "cob"],
  );
  const unityCrossing = (h21: number[]) => {
    const f = vectors.ft.scale;
    const k = h21.findIndex((h) => h < 1);
    if (k < 1) throw new RangeError(`${family.id}: |h21e| does not cross 1 between ${f[0]} and ${f[f.length - 1]} Hz`);
    const t = Math.log(h21[k - 1]) / (Math.log(h21[k - 1]) - Math.log(h21[k]));
    return Math.exp(Math.log(f[k - 1]) + t * (Math.log(f[k]) - Math.log(f[k - 1])));
  };
  return Object.fromEntries(
    polaritiesOf(family).map((polarity) => {
      const p = tag(polarity);
      return [polarity, { ftHz: unityCrossing(vectors.ft[`h21${p}`]), cobFarads: vectors.cob[`cob${p}`][0] }];
    }),
  ) as Partial<Record<Polarity, { ftHz: number; cobFarads: number }>>;
}

export function simulateFamily(family: DeviceFamily): FamilyReadings {
  requireNgspice();
  const typical = readTypical(family);
  const mainHfe = Object.fromEntries(polaritiesOf(family).map((p) => [p, typical[p]!.gain[family.mainGain]]));
  const groups = simulateGroups(family, mainHfe);
  const smallSignal = runSmallSignal(family, Object.fromEntries(polaritiesOf(family).map((p) => [p, typical[p]!.ftBiasVolts])));
  const result: FamilyReadings = {};
  for (const polarity of polaritiesOf(family)) {
    const { ftBiasVolts: _bias, ...rest } = typical[polarity]!;
    const own = groups.filter((d) => d.polarity === polarity);
    result[polarity] = {
      ...rest,
      ...smallSignal[polarity]!,
      groups: Object.fromEntries(own.map((d) => [d.group, { bfFactor: d.bfFactor, gain: d.gain }])),
    };
  }
  return result;
}
