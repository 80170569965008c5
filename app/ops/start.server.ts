// npm start: PostgreSQL, the local mail inbox, migrations, demo data, a production build, the server.
import { execFileSync, type ChildProcess } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { demoPeople } from "#seeds/demo-people.ts";
import { loadOrCreateLocalSecrets } from "./local-secrets.server.ts";
import { runStep, startService, stopAll, waitForHttp } from "./processes.server.ts";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const appPort = Number(process.env.PORT ?? 3000);
const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
const inboxPort = Number(process.env.MAIL_INBOX_PORT ?? 1080);
const pgScript = path.join(root, "docker-free-pg.sh");

function pgIsRunning(): boolean {
  try {
    execFileSync("bash", [pgScript, "status"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

async function main() {
  const children: ChildProcess[] = [];
  const startedPg = !pgIsRunning();
  let stopping = false;
  const shutdown = async (code: number) => {
    if (stopping) return;
    stopping = true;
    console.log("\nbetasift: stopping");
    await stopAll(children);
    if (startedPg) execFileSync("bash", [pgScript, "down"], { stdio: "inherit" });
    process.exit(code);
  };
  process.on("SIGINT", () => void shutdown(0));
  process.on("SIGTERM", () => void shutdown(0));

  try {
    runStep("starting PostgreSQL", "bash", [pgScript, "up"], { cwd: root, loud: true });
    const databaseUrl = execFileSync("bash", [pgScript, "url", "dev"], { encoding: "utf8" }).trim();
    const inboxUrl = `http://127.0.0.1:${inboxPort}`;
    const serverEnv: NodeJS.ProcessEnv = {
      ...process.env,
      ...loadOrCreateLocalSecrets(root),
      NODE_ENV: "production",
      DATABASE_URL: databaseUrl,
      SMTP_HOST: "127.0.0.1",
      SMTP_PORT: String(smtpPort),
      MAIL_INBOX_URL: inboxUrl,
      HOST: "127.0.0.1",
      PORT: String(appPort),
      PUBLIC_ORIGIN: process.env.PUBLIC_ORIGIN ?? `http://127.0.0.1:${appPort}`,
    };
    const bin = (name: string) => path.join(root, "node_modules", ".bin", name);

    console.log(`betasift: starting the local mail inbox on ${inboxUrl}`);
    children.push(
      startService(
        bin("maildev"),
        ["--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "--smtp", String(smtpPort), "--web", String(inboxPort), "--mail-directory", path.join(root, ".maildev"), "--silent"],
        { cwd: root, quiet: true },
      ),
    );
    runStep("migrating the database", bin("tsx"), ["db/cli.ts", "migrate"], { cwd: root, env: serverEnv });
    runStep("loading the demo data where missing", bin("tsx"), ["db/cli.ts", "seed"], { cwd: root, env: serverEnv });
    runStep("building the app", bin("react-router"), ["build"], { cwd: root, env: { ...serverEnv, NODE_ENV: "production" } });

    // One server worker per core behind one port (app/ops/serve.server.ts).
    children.push(startService(bin("tsx"), ["app/ops/serve.server.ts", "build/server/index.js"], { cwd: root, env: serverEnv, quiet: true }));
    await waitForHttp(`http://127.0.0.1:${appPort}/api/health`, 60_000);

    const accounts = demoPeople.map((p) => `    ${p.email.padEnd(34)} ${p.displayName} (${p.roles.join(", ")}): ${p.does}`).join("\n");
    console.log(`
Betasift is running at http://127.0.0.1:${appPort}

  Sign in with one of the demo accounts; the code arrives by e-mail:
${accounts}

  Read the e-mails (sign-in codes) at ${inboxUrl}
  Press Ctrl-C to stop everything this command started.
`);
    for (const child of children) {
      child.once("exit", (code) => {
        if (!stopping) {
          console.error(`betasift: a service stopped unexpectedly (exit ${code}); shutting down`);
          void shutdown(1);
        }
      });
    }
  } catch (error) {
    console.error(`betasift: could not start: ${error instanceof Error ? error.message : String(error)}`);
    await shutdown(1);
  }
}

void main();
