/**
 * A teacher uploads a roster CSV in the browser: the preview marks a bad row with its reason
 * and offers no save; a good file replaces the roster. Also the real-demonstrations guide.
 */
import { describe, expect, it } from "vitest";
import { keepScreenshot, openClassFromHome, pickAccount, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const ctx = useDemoInBrowser();

describe("roster upload in the browser", () => {
  it("previews each row, refuses a file with a bad row, and saves a good one", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url);
    await signInAs(page, ctx.stack.url, "Tom Ashdown");
    await openClassFromHome(page, "12 Physics, set 1");
    // The demo roster is there (the roster loads after the class heading).
    await page.getByRole("form", { name: "Roster" }).getByRole("textbox").first().waitFor();

    const input = page.getByTestId("roster-csv-input");
    await input.setInputFiles({
      name: "set1.csv",
      mimeType: "text/csv",
      buffer: Buffer.from("Name\nMira T.\nSilas Worthington\nJonah B.\nmira t\n"),
    });
    await page.getByRole("heading", { name: "Preview of set1.csv" }).waitFor();
    await page.getByText("Rejected: Looks like a full name").waitFor();
    await page.getByText("Rejected: Duplicate").waitFor();
    await page.getByText("Nothing has been saved.").waitFor();
    expect(await page.getByRole("button", { name: /Replace the roster/ }).count()).toBe(0);
    const statuses = await page.locator("tr[data-status]").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-status")));
    expect(statuses).toEqual(["accepted", "rejected", "accepted", "rejected"]);
    await keepScreenshot(page, "e2e", "12-roster-csv-preview-rejected");

    // A file that is not text is refused by its content, whatever its name.
    await input.setInputFiles({ name: "photo.csv", mimeType: "text/csv", buffer: Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0, 13]) });
    await page.getByText("photo.csv: This is not a CSV text file.", { exact: false }).waitFor();

    await input.setInputFiles({ name: "set1-fixed.csv", mimeType: "text/csv", buffer: Buffer.from("Name\nMira T.\nSilas W.\nJonah B.\n") });
    await page.getByRole("heading", { name: "Preview of set1-fixed.csv" }).waitFor();
    await page.getByRole("button", { name: "Replace the roster with these 3 names" }).click();
    await page.getByText("Roster saved from the file: 3 names.").first().waitFor();
    await page.reload();
    await page.getByRole("heading", { name: "12 Physics, set 1" }).waitFor();
    const names = page.getByRole("form", { name: "Roster" }).getByRole("textbox");
    await names.first().waitFor();
    expect(await names.evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value))).toEqual(["Mira T.", "Silas W.", "Jonah B."]);
    await keepScreenshot(page, "e2e", "13-roster-csv-saved");

    expect(problems).toEqual([]);
    await context.close();
  });

  it("the real demonstrations guide, with its safety card, is reachable from the home page", async () => {
    const context = await ctx.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${ctx.stack.url}/sign-in`);
    await pickAccount(page, "Priya Lindqvist");
    await page.waitForURL(`${ctx.stack.url}/`);
    await page.getByRole("link", { name: /Real demonstrations/ }).click();
    await page.getByRole("heading", { name: "Real demonstrations", level: 1 }).waitFor();
    await page.getByRole("heading", { name: /Safety card/ }).waitFor();
    await page.getByText("Tall drops are for the simulation.").waitFor();
    await page.getByText(/risk assessment.*come first/).waitFor();
    await keepScreenshot(page, "e2e", "14-real-demonstrations");
    await context.close();
  });
});
