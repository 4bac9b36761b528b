import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { CHROMIUM_ARGS, ensureChromium } from "./chromium";
import { TEST_OUTPUT_DIR } from "./paths";

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
