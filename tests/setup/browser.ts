import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type Browser } from "playwright-core";

export const ARTIFACTS = path.resolve(import.meta.dirname, "../artifacts");

/** Debian's Chromium, headless, kept off every network but loopback; playwright gives it a fresh profile. */
export async function launchBrowser(): Promise<Browser> {
  mkdirSync(ARTIFACTS, { recursive: true });
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-dev-shm-usage",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export function artifactPath(name: string): string {
  return path.join(ARTIFACTS, name);
}
