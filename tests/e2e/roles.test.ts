/**
 * Role-aware navigation in the browser: the head of department looks at a colleague's class
 * without edit controls; the school admin gets staff management and no classes.
 */
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { DEMO_UNINVITED } from "../../server/db/seed/demo-data";
import { keepScreenshot, pickAccount, useDemoInBrowser } from "../support/browser";

const ctx = useDemoInBrowser();

async function signedIn(name: string): Promise<Page> {
  const context = await ctx.browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await page.goto(`${ctx.stack.url}/sign-in`);
  await pickAccount(page, name);
  await page.waitForURL((url) => url.origin === ctx.stack.url && !url.pathname.startsWith("/sign-in"));
  return page;
}

async function navLinks(page: Page) {
  const nav = page.getByRole("navigation", { name: "Main" });
  await nav.getByRole("link").first().waitFor();
  return (await nav.getByRole("link").allInnerTexts()).map((t) => t.trim());
}

describe("what each role is offered", () => {
  it("the head of department opens a colleague's class read-only from the department page", async () => {
    const page = await signedIn("Helen Marrable");
    expect(await navLinks(page)).toEqual(expect.arrayContaining(["Home", "Classes", "Department"]));
    await page.getByRole("link", { name: "Department" }).first().click();
    await page.getByRole("link", { name: "10A Physics" }).click();
    await page.getByRole("heading", { name: "10A Physics" }).waitFor();
    await page.getByText("Aisha A.").first().waitFor();
    // No way to change what is not hers.
    expect(await page.getByRole("button", { name: "Edit details" }).count()).toBe(0);
    expect(await page.getByRole("button", { name: "Save roster" }).count()).toBe(0);
    expect(await page.getByRole("button", { name: "Archive class" }).count()).toBe(0);
    await keepScreenshot(page, "e2e", "05-head-reads-class");
    await page.context().close();
  });

  it("the school admin manages staff and is not offered classes", async () => {
    const page = await signedIn("Gareth Pell");
    await page.waitForURL(`${ctx.stack.url}/staff`);
    await page.getByRole("heading", { name: "Staff", exact: true }).waitFor();
    const links = await navLinks(page);
    expect(links).toContain("Staff");
    expect(links).not.toContain("Classes");
    await page.goto(`${ctx.stack.url}/classes`);
    await page.getByRole("heading", { name: "This page is not part of your role" }).waitFor();
    await keepScreenshot(page, "e2e", "06-admin-on-classes");
    await page.context().close();
  });

  it("someone who was never invited is asked to get an invitation, with the address they used", async () => {
    const context = await ctx.browser.newContext();
    const page = await context.newPage();
    await page.goto(`${ctx.stack.url}/sign-in`);
    await pickAccount(page, DEMO_UNINVITED.name);
    await page.waitForURL(`${ctx.stack.url}/sign-in/not-invited`);
    await page.getByRole("heading", { name: "Ask your department to invite you" }).waitFor();
    await page.getByText(DEMO_UNINVITED.email).waitFor();
    await context.close();
  });
});
