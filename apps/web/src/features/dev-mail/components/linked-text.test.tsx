import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { LinkedText } from "./linked-text.tsx";

describe("LinkedText", () => {
  it("turns web addresses into links and leaves the sentence's full stop outside", () => {
    const text = "Mara Linden invited you to Wrenfield Sound.\nAccept here: http://localhost:3000/invitations/abc_123-XYZ.\nThanks!";
    const { container } = render(<LinkedText text={text} />);

    const link = screen.getByRole("link", { name: "http://localhost:3000/invitations/abc_123-XYZ" });
    expect(link).toHaveAttribute("href", "http://localhost:3000/invitations/abc_123-XYZ");
    expect(container.textContent).toBe(text);
  });

  it("leaves text without addresses alone", () => {
    render(<LinkedText text="No links in this one." />);
    expect(screen.queryByRole("link")).not.toBeInTheDocument();
    expect(screen.getByText("No links in this one.")).toBeInTheDocument();
  });
});
