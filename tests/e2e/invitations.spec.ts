import { describe, expect, it } from "vitest";
import { linkIn, newPage, signIn, unique, useBrowser, waitForMail } from "./support/browser.ts";

useBrowser();

describe("inviting a member of staff", () => {
  it("the owner invites an engineer, who accepts from the e-mail and lands signed in", async () => {
    const email = `engineer-${unique()}@wrenfield.test`;
    const owner = await newPage();
    await signIn(owner.page, "owner@wrenfield.test");
    await owner.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Team" }).click();
    await owner.page.getByRole("button", { name: "Invite someone" }).click();
    const dialog = owner.page.getByRole("dialog");
    await dialog.getByLabel("Name").fill("Wren Holloway");
    await dialog.getByLabel("E-mail").fill(email);
    await dialog.getByLabel("Role").selectOption("engineer");
    await dialog.getByRole("button", { name: "Send invitation" }).click();
    await expect.poll(() => owner.page.getByText(email).count()).toBeGreaterThan(0);
    await owner.context.close();

    const message = await waitForMail(email);
    expect(message.subject).toBe("Wrenfield Sound invites you to join as engineer");
    const invitee = await newPage();
    await invitee.page.goto(linkIn(message.text, "/invitations/"));
    await expect.poll(() => invitee.page.getByText("Wren Holloway").count()).toBeGreaterThan(0);
    await invitee.page.getByLabel("Password", { exact: true }).fill("wren-holloway-pass");
    await invitee.page.getByLabel("Confirm password").fill("wren-holloway-pass");
    await invitee.page.getByRole("button", { name: "Accept and sign in" }).click();
    await expect.poll(() => invitee.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "My day" }).count()).toBe(1);
    await invitee.context.close();

    const again = await newPage();
    await signIn(again.page, email, "wren-holloway-pass");
    await expect.poll(() => again.page.getByText("Wren Holloway").count()).toBeGreaterThan(0);
    await again.context.close();
  });
});
