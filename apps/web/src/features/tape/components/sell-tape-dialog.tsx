import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import type { TapeProductDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useCustomerProjects, useCustomers } from "../api/get-customers.ts";
import { useSellTape } from "../api/move-tape.ts";
import { money } from "./tape-format.ts";

const sellForm = z.object({
  quantity: z.string().regex(/^[1-9]\d{0,4}$/, "Enter a whole number of reels"),
  clientAccountId: z.string().regex(/^\d+$/, "Choose a client"),
  projectId: z.string(),
  bookingId: z.string().regex(/^(\d{1,12})?$/, "Enter a booking number, or leave it empty"),
  unitPrice: z.string().regex(/^(\d{1,7}(\.\d{1,2})?)?$/, "Enter a price such as 320.00, or leave it for the product's price"),
});
type SellFormValues = z.infer<typeof sellForm>;
const fields = ["quantity", "clientAccountId", "projectId", "bookingId", "unitPrice"] as const;

export function SellTapeDialog({ product, currency, onClose }: { product: TapeProductDto; currency: string; onClose: () => void }) {
  const toast = useToast();
  const sell = useSellTape(product.id);
  const customers = useCustomers();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, watch } = useForm<SellFormValues>({
    resolver: zodResolver(sellForm),
    defaultValues: { quantity: "1", clientAccountId: "", projectId: "", bookingId: "", unitPrice: "" },
  });
  const clientId = Number(watch("clientAccountId")) || null;
  const projects = useCustomerProjects(clientId);
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const sale = await sell.mutateAsync({
        quantity: Number(values.quantity),
        clientAccountId: Number(values.clientAccountId),
        ...(values.projectId ? { projectId: Number(values.projectId) } : {}),
        ...(values.bookingId ? { bookingId: Number(values.bookingId) } : {}),
        ...(values.unitPrice ? { unitPriceCents: Math.round(Number(values.unitPrice) * 100) } : {}),
      });
      toast(`${-sale.quantity} × ${product.name} sold to ${sale.clientName ?? "the client"} for ${money(sale.amountCents, currency)}`);
      onClose();
    } catch (error) {
      setFormError(applyApiErrors(error, setError, { fields, codeFields: { insufficient_stock: "quantity", no_price: "unitPrice" } }));
    }
  });
  const { errors } = formState;
  return (
    <Dialog open onClose={onClose} title={`Sell ${product.name}`} description={`${product.onHand} on hand · price ${money(product.priceCents, currency)} a reel`}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <div className="grid gap-4 sm:grid-cols-2">
          <FormField label="Reels" error={errors.quantity?.message}>
            {(field) => <Input {...field} {...register("quantity")} inputMode="numeric" autoComplete="off" />}
          </FormField>
          <FormField label="Price per reel" optional error={errors.unitPrice?.message} hint="Leave empty for the product's price">
            {(field) => <Input {...field} {...register("unitPrice")} inputMode="decimal" autoComplete="off" />}
          </FormField>
          <FormField label="Client" error={errors.clientAccountId?.message}>
            {(field) => (
              <Select {...field} {...register("clientAccountId")}>
                <option value="">Choose a client</option>
                {(customers.data ?? []).filter((c) => c.active).map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                  </option>
                ))}
              </Select>
            )}
          </FormField>
          <FormField label="Project" optional error={errors.projectId?.message}>
            {(field) => (
              <Select {...field} {...register("projectId")} disabled={!clientId}>
                <option value="">No project</option>
                {(projects.data ?? []).map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.name}
                  </option>
                ))}
              </Select>
            )}
          </FormField>
          <FormField label="Booking number" optional error={errors.bookingId?.message}>
            {(field) => <Input {...field} {...register("bookingId")} inputMode="numeric" autoComplete="off" />}
          </FormField>
        </div>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" pending={formState.isSubmitting}>
            Sell reels
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
