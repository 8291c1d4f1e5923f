import { useState } from "react";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { Dialog } from "./dialog.tsx";

function Harness() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button type="button" onClick={() => setOpen(true)}>
        Book a hold
      </button>
      <Dialog open={open} onClose={() => setOpen(false)} title="Hold Room A">
        <label htmlFor="hold-client">Client</label>
        <input id="hold-client" />
        <button type="button">Place hold</button>
      </Dialog>
    </>
  );
}

describe("Dialog", () => {
  it("moves focus inside, keeps Tab within it, and closes on Escape giving focus back", async () => {
    const user = userEvent.setup();
    render(<Harness />);
    const opener = screen.getByRole("button", { name: "Book a hold" });

    await user.click(opener);
    const dialog = screen.getByRole("dialog", { name: "Hold Room A" });
    expect(dialog).toHaveAttribute("aria-modal", "true");
    expect(screen.getByLabelText("Client")).toHaveFocus();

    await user.tab();
    expect(screen.getByRole("button", { name: "Place hold" })).toHaveFocus();
    await user.tab();
    expect(screen.getByRole("button", { name: "Close" })).toHaveFocus();
    await user.tab({ shift: true });
    expect(screen.getByRole("button", { name: "Place hold" })).toHaveFocus();

    await user.keyboard("{Escape}");
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
    expect(opener).toHaveFocus();
  });
});
