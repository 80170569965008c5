import { execFileSync, spawn, type ChildProcess } from "node:child_process";

/** Runs one step; its own output is shown only when it fails (or with `loud`), so the start log stays short. */
export function runStep(label: string, command: string, args: string[], options: { cwd: string; env?: NodeJS.ProcessEnv; loud?: boolean }) {
  console.log(`betasift: ${label}`);
  if (options.loud) {
    execFileSync(command, args, { cwd: options.cwd, env: options.env ?? process.env, stdio: "inherit" });
    return;
  }
  try {
    execFileSync(command, args, { cwd: options.cwd, env: options.env ?? process.env, stdio: "pipe" });
  } catch (error) {
    const { stdout, stderr } = error as { stdout?: Buffer; stderr?: Buffer };
    process.stderr.write(`${stdout?.toString() ?? ""}${stderr?.toString() ?? ""}`);
    throw new Error(`${label} failed`);
  }
}

export function startService(command: string, args: string[], options: { cwd: string; env?: NodeJS.ProcessEnv; quiet?: boolean }): ChildProcess {
  return spawn(command, args, {
    cwd: options.cwd,
    env: options.env ?? process.env,
    stdio: options.quiet ? ["ignore", "ignore", "inherit"] : ["ignore", "inherit", "inherit"],
  });
}

export async function waitForHttp(url: string, timeoutMs: number): Promise<Response> {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  while (Date.now() < deadline) {
    try {
      const response = await fetch(url);
      if (response.ok) return response;
      lastError = new Error(`${url} answered ${response.status}`);
    } catch (error) {
      lastError = error;
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000} s: ${String(lastError)}`);
}

export function stopAll(children: ChildProcess[]): Promise<void> {
  return Promise.all(
    children.map(
      (child) =>
        new Promise<void>((resolve) => {
          if (child.exitCode !== null || child.signalCode !== null) return resolve();
          child.once("exit", () => resolve());
          child.kill("SIGTERM");
          setTimeout(() => child.kill("SIGKILL"), 5000).unref();
        }),
    ),
  ).then(() => undefined);
}
