import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll, inject } from "vitest";
import { DEMO_STAFF, DEMO_UNINVITED } from "../../server/db/seed/demo-data";
import { seedDemo } from "../../server/db/seed/seed-demo";
import { CHROMIUM_ARGS, ensureChromium } from "./chromium";
import { TEST_OUTPUT_DIR } from "./paths";
import { useTestStack, type TestContext } from "./test-stack";

/** Debian's chromium driven by playwright-core (never a downloaded browser). */
export async function launchBrowser(): Promise<Browser> {
  const executablePath = await ensureChromium();
  return chromium.launch({ executablePath, args: CHROMIUM_ARGS });
}

/** Saves a full-page screenshot under tests/output/<group>/ and returns its path. */
export async function keepScreenshot(page: Page, group: string, name: string): Promise<string> {
  const dir = join(TEST_OUTPUT_DIR, group);
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/**
 * For a browser test file: the demo school in a database of its own, the app serving the
 * client built by the global setup, the local sign-in page listing the demo accounts, and a
 * browser. All torn down after the file.
 */
export function useDemoInBrowser(): TestContext<boolean> & { browser: Browser } {
  const ctx = useTestStack(seedDemo, {
    clientDir: inject("clientDir"),
    accounts: [...DEMO_STAFF.map((s) => ({ email: s.email, name: s.displayName })), DEMO_UNINVITED],
  }) as TestContext<boolean> & { browser: Browser };
  beforeAll(async () => {
    ctx.browser = await launchBrowser();
  });
  afterAll(async () => {
    await ctx.browser?.close();
  });
  return ctx;
}

/** From the sign-in page: the sign-in link, then the account named `name` on the local provider's page. */
/**
 * A fresh page in its own browser context that records what went wrong on it: script errors
 * and console errors from the app's own origin (a test ends with `expect(problems).toEqual([])`).
 */
export async function watchedPage(browser: Browser, appUrl: string, viewport = { width: 1280, height: 1000 }) {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(e.message));
  page.on("console", (m) => m.type() === "error" && m.location().url.startsWith(appUrl) && problems.push(m.text()));
  return { context, page, problems };
}

/** From the sign-in page, through the local sign-in provider, to the page a person lands on. */
export async function signInAs(page: Page, appUrl: string, name: string, landing = "/"): Promise<void> {
  await page.goto(`${appUrl}/sign-in`);
  await pickAccount(page, name);
  await page.waitForURL(`${appUrl}${landing}`);
}

/**
 * Opens a class from home's "Your classes". Scoped to that section because "Recent lessons" also
 * links by class name, and whichever list loads first would otherwise take the click.
 */
export async function openClassFromHome(page: Page, className: string): Promise<void> {
  await page.getByRole("region", { name: "Your classes" }).getByRole("link", { name: className }).first().click();
  await page.getByRole("heading", { name: className }).waitFor();
}

export async function pickAccount(page: Page, name: string): Promise<void> {
  await page.getByRole("link", { name: "Sign in with your school account" }).click();
  await page.getByRole("button", { name: new RegExp(name) }).click();
}
