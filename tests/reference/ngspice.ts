// Runs netlists through Debian's ngspice in batch mode and reads back the vectors it writes.
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

/** The folder holding the invented Gummel-Poon model cards. */
export const MODELS_DIR = fileURLToPath(new URL("./models/", import.meta.url));
/** The library file with every invented model card. */
export const MODEL_LIBRARY = join(MODELS_DIR, "invented-bjt.lib");

export interface Simulation {
  /** Title line of the netlist (ngspice ignores the first line as a title). */
  title: string;
  /** Circuit lines: sources, devices, options; the model library is included for you. */
  circuit: string;
  /** One analysis command as typed in a control block, e.g. "dc IB 20u 2m 20u" or "op". */
  analysis: string;
  /** Vectors to write, as ngspice names them, e.g. "i(VC)", "v(b)", "@q1[ic]". */
  vectors: string[];
}

/** The vectors of one run, keyed by lower-cased name; "scale" holds the sweep variable (absent for "op"). */
export type Vectors = Record<string, number[]>;

/** Fails with a clear message when ngspice is not installed (the test command installs it; tests must not skip). */
export function requireNgspice(): string {
  const probe = spawnSync("ngspice", ["-v"], { encoding: "utf8" });
  if (probe.error || probe.status !== 0) {
    throw new Error(
      "ngspice is not installed or does not run (`ngspice -v` failed). Install it with `apt-get install -y ngspice`; the test command does this when it is missing.",
    );
  }
  return (probe.stdout.match(/ngspice-\d+(\.\d+)?/) ?? ["ngspice"])[0];
}

/** Builds the netlist text: title, model library, circuit, a control block that runs and writes, quit 0. */
export function buildNetlist(simulation: Simulation): string {
  return [
    simulation.title,
    `.include ${MODEL_LIBRARY}`,
    simulation.circuit.trim(),
    ".control",
    "set wr_singlescale",
    "set wr_vecnames",
    simulation.analysis,
    `wrdata @OUT@ ${simulation.vectors.join(" ")}`,
    // Without quit 0 batch mode exits with status 1.
    "quit 0",
    ".endc",
    ".end",
    "",
  ].join("\n");
}

/** Parses a wrdata file written with wr_singlescale and wr_vecnames: a header of names, then rows of numbers. */
export function parseWrdata(text: string): Vectors {
  const lines = text.split("\n").map((line) => line.trim()).filter((line) => line.length > 0);
  if (lines.length < 2) throw new Error(`ngspice wrote no data rows:\n${text}`);
  const names = lines[0].split(/\s+/).map((name) => name.toLowerCase());
  const vectors: Vectors = {};
  // The sweep variable of dc (e.g. "v-sweep"), tran ("time") and ac ("frequency") comes first; "op" writes none.
  const isScale = (name: string, index: number) => index === 0 && names.length > 1 && /sweep$|^time$|^frequency$/.test(name);
  names.forEach((name, index) => {
    vectors[isScale(name, index) ? "scale" : name] = [];
  });
  const keys = Object.keys(vectors);
  for (const line of lines.slice(1)) {
    const values = line.split(/\s+/).map(Number);
    if (values.length !== keys.length || values.some((v) => Number.isNaN(v))) throw new Error(`Unreadable ngspice row: ${line}`);
    keys.forEach((key, index) => vectors[key].push(values[index]));
  }
  return vectors;
}

/** Runs one simulation in a fresh temporary folder and returns its vectors; throws with ngspice's log on failure. */
export function simulate(simulation: Simulation): Vectors {
  requireNgspice();
  const folder = mkdtempSync(join(tmpdir(), "betasift-ngspice-"));
  try {
    const outPath = join(folder, "out.txt");
    const netlistPath = join(folder, "circuit.cir");
    writeFileSync(netlistPath, buildNetlist(simulation).replace("@OUT@", outPath));
    let log: string;
    try {
      log = execFileSync("ngspice", ["-b", netlistPath], { cwd: folder, encoding: "utf8", stdio: ["ignore", "pipe", "pipe"] });
    } catch (error) {
      const failure = error as { stdout?: string; stderr?: string };
      throw new Error(`ngspice failed on ${simulation.title}:\n${failure.stdout ?? ""}\n${failure.stderr ?? ""}`);
    }
    let data: string;
    try {
      data = readFileSync(outPath, "utf8");
    } catch {
      throw new Error(`ngspice wrote no output for ${simulation.title}:\n${log}`);
    }
    return parseWrdata(data);
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

/** One vector by name (case-insensitive), failing loudly when ngspice did not write it. */
export function vectorOf(vectors: Vectors, name: string): number[] {
  const vector = vectors[name.toLowerCase()];
  if (!vector) throw new Error(`No vector ${name}; have ${Object.keys(vectors).join(", ")}`);
  return vector;
}

/** Linear interpolation of y at x0 over a monotone x (rising or falling). */
export function valueAt(x: number[], y: number[], x0: number): number {
  const rising = x[x.length - 1] >= x[0];
  for (let i = 1; i < x.length; i += 1) {
    const a = x[i - 1];
    const b = x[i];
    if (rising ? a <= x0 && x0 <= b : b <= x0 && x0 <= a) {
      const t = b === a ? 0 : (x0 - a) / (b - a);
      return y[i - 1] + t * (y[i] - y[i - 1]);
    }
  }
  throw new RangeError(`${x0} lies outside the simulated range ${x[0]} .. ${x[x.length - 1]}`);
}

/** Reads one parameter of a model card from the invented library, e.g. modelParameter("QGP_N1", "VAF"). */
export function modelParameter(modelName: string, parameter: string): number {
  const library = readFileSync(MODEL_LIBRARY, "utf8").replace(/\n\+/g, " ");
  const card = library.split("\n").find((line) => new RegExp(`^\\.model\\s+${modelName}\\s`, "i").test(line));
  if (!card) throw new Error(`No model ${modelName} in ${MODEL_LIBRARY}`);
  const match = card.match(new RegExp(`\\b${parameter}\\s*=\\s*([0-9.eE+-]+)([a-zA-Z]*)`, "i"));
  if (!match) throw new Error(`Model ${modelName} sets no ${parameter}`);
  return Number(match[1]) * scaleOfSuffix(match[2]);
}

/** SPICE scale suffixes (case-insensitive; "meg" before "m"). */
function scaleOfSuffix(suffix: string): number {
  const s = suffix.toLowerCase();
  if (s.startsWith("meg")) return 1e6;
  const table: Record<string, number> = { f: 1e-15, p: 1e-12, n: 1e-9, u: 1e-6, m: 1e-3, k: 1e3, g: 1e9, t: 1e12 };
  return s.length === 0 ? 1 : (table[s[0]] ?? 1);
}
