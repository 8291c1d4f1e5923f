import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { lanternStatic } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { AddClientDialog, EditClientDialog } from "./client-form-dialog.tsx";

const created = { ...lanternStatic, id: 6, name: "Copper Vale" };

describe("AddClientDialog", () => {
  it("sends the client with its contacts, the chosen one marked primary", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/clients", reply: { status: 201, body: created } },
      { method: "GET", path: "/api/clients", reply: { body: [] } },
    ]);
    const onCreated = vi.fn();
    const { user } = renderWithApp(<AddClientDialog open onClose={() => undefined} onCreated={onCreated} />);
    const dialog = within(screen.getByRole("dialog", { name: "Add a client" }));

    await user.type(dialog.getByLabelText("Name"), "Copper Vale");
    await user.selectOptions(dialog.getByLabelText("Kind"), "band");
    await user.type(dialog.getByLabelText("E-mail"), "hello@coppervale.test");
    await user.type(dialog.getAllByLabelText("Contact name")[0]!, "Nell Brightwater");
    await user.click(dialog.getByRole("button", { name: "Add a contact" }));
    await user.click(dialog.getByRole("button", { name: "Add a contact" }));
    await user.type(dialog.getAllByLabelText("Contact name")[1]!, "Temporary row");
    await user.type(dialog.getAllByLabelText("Contact name")[2]!, "Ines Halloran");
    await user.type(dialog.getAllByLabelText("Contact note")[2]!, "Producing the record");
    await user.click(dialog.getAllByLabelText("Primary contact")[2]!);
    await user.click(dialog.getByRole("button", { name: "Remove contact 2" }));
    await user.click(dialog.getByRole("button", { name: "Save client" }));

    await vi.waitFor(() => expect(onCreated).toHaveBeenCalledWith(created));
    expect(calls.find((c) => c.method === "POST")?.body).toEqual({
      name: "Copper Vale",
      kind: "band",
      email: "hello@coppervale.test",
      phone: "",
      billingAddress: "",
      notes: "",
      contacts: [
        { name: "Nell Brightwater", email: "", phone: "", note: "", isPrimary: false },
        { name: "Ines Halloran", email: "", phone: "", note: "Producing the record", isPrimary: true },
      ],
    });
  });

  it("shows a contact's field error from the API on that contact's row", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/clients",
        reply: {
          status: 400,
          body: {
            error: {
              code: "invalid_input",
              message: "Check the request",
              details: [{ field: "contacts.0.phone", rule: "too_big", message: "Use at most 40 characters" }],
            },
          },
        },
      },
    ]);
    const { user } = renderWithApp(<AddClientDialog open onClose={() => undefined} onCreated={() => undefined} />);

    await user.type(screen.getByLabelText("Name"), "Blue Hour Records");
    await user.type(screen.getByLabelText("Contact name"), "Corin Mayfield");
    await user.click(screen.getByRole("button", { name: "Save client" }));

    expect(await screen.findByText("Use at most 40 characters")).toBeInTheDocument();
    expect(screen.getByLabelText("Contact phone")).toHaveAttribute("aria-invalid", "true");
  });
});

describe("EditClientDialog", () => {
  it("starts from the saved client and sends the whole contact list back", async () => {
    const { calls } = mockApi([
      { method: "PATCH", path: "/api/clients/1", reply: { body: { ...lanternStatic, phone: "555-0199" } } },
      { method: "GET", path: "/api/clients", reply: { body: [] } },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<EditClientDialog open onClose={onClose} client={lanternStatic} />);

    const phone = screen.getByLabelText("Phone");
    expect(phone).toHaveValue("555-0181");
    await user.clear(phone);
    await user.type(phone, "555-0199");
    await user.click(screen.getByRole("button", { name: "Save changes" }));

    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(calls.find((c) => c.method === "PATCH")?.body).toMatchObject({
      phone: "555-0199",
      contacts: [{ name: "Rosa Delacourt", email: "rosa@lanternstatic.test", phone: "555-0182", note: "", isPrimary: true }],
    });
  });
});
