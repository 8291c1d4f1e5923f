import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { describe, expect, it } from "vitest";
import { passwordResetRequestInput } from "@takeup/domain";
import { FormField } from "./form-field.tsx";
import { Input } from "./input.tsx";

function EmailForm() {
  const { register, handleSubmit, formState } = useForm({
    resolver: zodResolver(passwordResetRequestInput),
    defaultValues: { email: "" },
  });
  return (
    <form onSubmit={handleSubmit(() => undefined)} noValidate>
      <FormField label="E-mail" hint="The one you sign in with." error={formState.errors.email?.message}>
        {(field) => <Input {...field} {...register("email")} type="email" />}
      </FormField>
      <button type="submit">Send</button>
    </form>
  );
}

describe("FormField", () => {
  it("shows the schema's error text for a bad e-mail and ties it to the input", async () => {
    const user = userEvent.setup();
    render(<EmailForm />);

    const input = screen.getByLabelText("E-mail");
    expect(input).not.toHaveAttribute("aria-invalid");
    expect(input).toHaveAccessibleDescription("The one you sign in with.");

    await user.type(input, "mara-at-wrenfield");
    await user.click(screen.getByRole("button", { name: "Send" }));

    expect(await screen.findByText("Enter a valid e-mail address")).toBeInTheDocument();
    expect(input).toHaveAttribute("aria-invalid", "true");
    expect(input).toHaveAccessibleDescription("The one you sign in with. Enter a valid e-mail address");
  });
});
