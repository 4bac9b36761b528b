/**
 * In a real browser against the real server, Postgres and local SMTP server: the school admin
 * invites a teacher and reads the captured e-mail; the invited teacher follows its link and
 * signs in; the admin moves her between departments; the admin's pupil-data and privacy pages.
 */
import { describe, expect, it } from "vitest";
import { keepScreenshot, pickAccount, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const ctx = useDemoInBrowser();

describe("the school admin in the browser", () => {
  it("invites a teacher, sees the captured e-mail, and the teacher signs in through its link", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 1280, height: 900 });
    await signInAs(page, ctx.stack.url, "Gareth Pell", "/staff");
    await page.getByRole("heading", { name: "Invite a member of staff" }).waitFor();

    // An empty form is refused with the reasons beside the fields, and nothing is sent.
    const form = page.getByRole("form", { name: "Invite a member of staff" });
    await form.getByRole("button", { name: "Send invitation" }).click();
    await form.getByText("Give the person’s name, as colleagues know it.").waitFor();

    await form.getByLabel("Name", { exact: true }).fill("Noor Haddad");
    await form.getByLabel("School e-mail address").fill("noor.haddad@brackenfold.example");
    await form.getByLabel("Role").selectOption("teacher");
    await form.getByLabel("Department").selectOption({ label: "Science" });
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText("Invitation sent to").waitFor();
    const waiting = page.getByRole("region", { name: "Invitations waiting" });
    await waiting.getByText("noor.haddad@brackenfold.example").waitFor();
    await keepScreenshot(page, "e2e", "07-admin-invited-teacher");

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Captured mail" }).click();
    await page.getByRole("heading", { name: "Captured mail", level: 1 }).waitFor();
    const message = page.getByRole("article").filter({ hasText: "noor.haddad@brackenfold.example" });
    await message.getByRole("heading", { name: "Your invitation to Linkleap at Brackenfold Academy" }).waitFor();
    const body = await message.locator("pre").innerText();
    expect(body).toContain("Hello Noor Haddad");
    expect(body).toContain("as a teacher in the Science department");
    await keepScreenshot(page, "e2e", "08-admin-captured-mail");

    // The invited teacher, in another browser, follows the link and signs in with that address.
    const link = /https?:\/\/\S+\/auth\/invitation\/[A-Za-z0-9_-]+/.exec(body)![0];
    expect(new URL(link).origin).toBe(ctx.stack.url);
    const inviteeContext = await ctx.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const invitee = await inviteeContext.newPage();
    await invitee.goto(link);
    // The local sign-in page: "Someone else" opens the form for any name and address.
    await invitee.getByText("Someone else").waitFor();
    if (!(await invitee.getByLabel("Name").isVisible())) await invitee.getByText("Someone else").click();
    await invitee.getByLabel("Name").fill("Noor Haddad");
    await invitee.getByLabel("E-mail address").fill("noor.haddad@brackenfold.example");
    await invitee.getByRole("button", { name: "Continue" }).click();
    await invitee.waitForURL(`${ctx.stack.url}/`);
    await invitee.getByRole("heading", { name: /Noor/ }).waitFor();
    await keepScreenshot(invitee, "e2e", "09-invited-teacher-home");
    await inviteeContext.close();

    // The admin's list now has the new teacher, and no invitation waits.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Staff" }).click();
    await page.getByText("noor.haddad@brackenfold.example").first().waitFor();
    await page.getByRole("region", { name: "Invitations waiting" }).getByText("No invitations waiting").waitFor();

    // The admin moves her out of Science and back; each choice is still there after a reload.
    const department = page.getByRole("combobox", { name: "Department for Noor Haddad" });
    for (const [label, value] of [["None", ""], ["Science", null]] as const) {
      await department.selectOption({ label });
      await page.getByRole("button", { name: "Save department for Noor Haddad" }).click();
      await page.getByText("Their classes stay where they were.").waitFor();
      await page.reload();
      await department.waitFor();
      expect(await department.evaluate((select: HTMLSelectElement) => select.selectedOptions[0]?.textContent)).toBe(label);
      if (value !== null) expect(await department.inputValue()).toBe(value);
    }
    // A head of department cannot be left without one: the server's reason shows beside the choice.
    await page.getByRole("combobox", { name: "Department for Helen Marrable" }).selectOption({ label: "None" });
    await page.getByRole("button", { name: "Save department for Helen Marrable" }).click();
    await page.getByRole("alert").getByText("A head of department must keep a department").waitFor();
    await keepScreenshot(page, "e2e", "09b-admin-staff-departments");

    // The school's time zone: saved, and still chosen after a reload.
    const zone = page.getByRole("combobox", { name: "Time zone" });
    expect(await zone.inputValue()).toBe("Europe/London");
    await zone.selectOption("Europe/Dublin");
    await page.getByRole("button", { name: "Save time zone" }).click();
    await page.getByRole("form", { name: "School time zone" }).getByText("Saved.").waitFor();
    await page.reload();
    await zone.waitFor();
    expect(await zone.inputValue()).toBe("Europe/Dublin");
    await zone.scrollIntoViewIfNeeded();
    await keepScreenshot(page, "e2e", "09c-admin-time-zone");
    await zone.selectOption("Europe/London");
    await page.getByRole("button", { name: "Save time zone" }).click();
    await page.getByRole("form", { name: "School time zone" }).getByText("Saved.").waitFor();

    // The one refused request is the head's move above.
    expect(problems).toEqual(["Failed to load resource: the server responded with a status of 400 (Bad Request)"]);
    await context.close();
  });

  it("shows the pupil-data page with the retention choice and the privacy page", async () => {
    const context = await ctx.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${ctx.stack.url}/sign-in`);
    await pickAccount(page, "Gareth Pell");
    await page.waitForURL(`${ctx.stack.url}/staff`);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Pupil data" }).click();
    await page.getByRole("heading", { name: "Pupil data", level: 1 }).waitFor();
    await page.getByText("10A Physics").first().waitFor();

    await page.getByLabel("For 90 days").check();
    await page.getByRole("button", { name: "Save retention period" }).click();
    await page.getByText("Saved. The next deletion run uses it.").waitFor();
    await keepScreenshot(page, "e2e", "10-admin-pupil-data");

    await page.getByRole("link", { name: "What is stored, and why" }).click();
    await page.getByRole("heading", { name: "Pupil data and privacy", level: 1 }).waitFor();
    await page.getByText("Your school keeps pupil data").waitFor();
    expect(await page.getByText("for 90 days", { exact: true }).count()).toBeGreaterThan(0);
    await keepScreenshot(page, "e2e", "11-privacy-page");
    await context.close();
  });
});
