import { afterAll, beforeAll, expect, inject, it } from "vitest";
import type { Browser } from "playwright-core";
import { artifactPath, launchBrowser } from "../setup/browser.ts";
import { signInCodeFrom, waitForMail } from "../setup/mail-catcher.ts";

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

it("the demo engineer signs in through the pages with the e-mailed code and reaches the dashboard", async () => {
  const page = await browser.newPage();
  const pageErrors: string[] = [];
  page.on("pageerror", (error) => pageErrors.push(error.message));
  page.on("console", (message) => {
    if (message.type() === "error") pageErrors.push(message.text());
  });

  await page.goto(`${inject("appUrl")}/`);
  await expect.poll(() => new URL(page.url()).pathname).toBe("/sign-in");
  await page.screenshot({ path: artifactPath("sign-in.png"), fullPage: true, caret: "initial" });

  const since = Date.now();
  await page.getByLabel("E-mail address").fill("engineer@larkfield.example.com");
  await page.getByRole("button", { name: "Send me a code" }).click();
  await page.waitForURL("**/sign-in/verify");
  await expect.poll(() => page.textContent("main")).toContain("engineer@larkfield.example.com");

  const code = signInCodeFrom(await waitForMail(inject("mailDir"), "engineer@larkfield.example.com", since));
  await page.getByLabel("Code").fill(code);
  await page.screenshot({ path: artifactPath("verify.png"), fullPage: true, caret: "initial" });
  await page.getByRole("button", { name: "Sign in" }).click();

  await page.waitForURL((url) => url.pathname === "/");
  await expect.poll(() => page.textContent("h1")).toBe("Hello, Ravi");
  await expect.poll(() => page.textContent("main")).toContain("Find the right transistor");
  expect(await page.getByRole("button", { name: "Sign out" }).isVisible()).toBe(true);
  await page.screenshot({ path: artifactPath("dashboard-engineer.png"), fullPage: true, caret: "initial" });
  expect(pageErrors).toEqual([]);
});
