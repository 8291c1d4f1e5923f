import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import type { TapeMovementDto, TapeProductDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useReceiveTape } from "../api/receive-tape.ts";
import { money } from "./tape-format.ts";

const maxBytes = 10 * 1024 * 1024;
const receiveForm = z.object({
  quantity: z.string().regex(/^[1-9]\d{0,4}$/, "Enter a whole number of reels"),
  unitCost: z.string().regex(/^\d{1,7}(\.\d{1,2})?$/, "Enter the cost of one reel, e.g. 210.00"),
  supplier: z.string().trim().min(1, "Name the supplier").max(120, "Use at most 120 characters"),
  receivedOn: z.iso.date("Use a date as YYYY-MM-DD"),
  file: z
    .custom<FileList>((v) => typeof FileList !== "undefined" && v instanceof FileList && v.length === 1, "Attach the receipt")
    .refine((files) => files[0]!.size <= maxBytes, "Attach a file of 10 MB or less"),
});
type ReceiveFormValues = z.infer<typeof receiveForm>;
const fields = ["quantity", "unitCost", "supplier", "receivedOn", "file"] as const;
const cents = (text: string) => String(Math.round(Number(text) * 100));

export function ReceiveTapeDialog({ product, currency, onClose, today }: { product: TapeProductDto; currency: string; onClose: () => void; today: string }) {
  const toast = useToast();
  const [done, setDone] = useState<TapeMovementDto | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const receive = useReceiveTape(product.id, setProgress);
  const { register, handleSubmit, setError, formState } = useForm<ReceiveFormValues>({
    resolver: zodResolver(receiveForm),
    defaultValues: { quantity: "", unitCost: "", supplier: "", receivedOn: today },
  });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    setProgress(0);
    try {
      const movement = await receive.mutateAsync({ quantity: values.quantity, unitCostCents: cents(values.unitCost), supplier: values.supplier, receivedOn: values.receivedOn, file: values.file[0]! });
      toast(`${movement.quantity} × ${product.name} received; ${movement.onHandAfter} on hand`);
      setDone(movement);
    } catch (error) {
      setProgress(null);
      setFormError(applyApiErrors(error, setError, { fields, codeFields: { unsupported_file_type: "file", file_too_large: "file", insufficient_stock: "quantity" } }));
    }
  });
  const { errors } = formState;
  if (done) {
    return (
      <Dialog open onClose={onClose} title={`Receive ${product.name}`}>
        <div className="flex flex-col gap-3" role="status">
          <UploadProgress fraction={1} />
          <p>
            Received {done.quantity} reel{done.quantity === 1 ? "" : "s"} from {done.supplier}: now {done.onHandAfter} on hand at an average cost of {money(done.averageCostAfterCents, currency)}.
          </p>
          <DialogActions>
            <Button onClick={onClose}>Done</Button>
          </DialogActions>
        </div>
      </Dialog>
    );
  }
  return (
    <Dialog open onClose={onClose} title={`Receive ${product.name}`} description="Record a delivery at its unit cost with the supplier's receipt (PDF, PNG or JPEG, up to 10 MB).">
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <div className="grid gap-4 sm:grid-cols-2">
          <FormField label="Reels received" error={errors.quantity?.message}>
            {(field) => <Input {...field} {...register("quantity")} inputMode="numeric" autoComplete="off" />}
          </FormField>
          <FormField label="Cost per reel" error={errors.unitCost?.message}>
            {(field) => <Input {...field} {...register("unitCost")} inputMode="decimal" autoComplete="off" />}
          </FormField>
          <FormField label="Supplier" error={errors.supplier?.message}>
            {(field) => <Input {...field} {...register("supplier")} autoComplete="off" />}
          </FormField>
          <FormField label="Received on" error={errors.receivedOn?.message}>
            {(field) => <Input {...field} {...register("receivedOn")} type="date" />}
          </FormField>
        </div>
        <FormField label="Receipt" error={errors.file?.message} hint="PDF, PNG or JPEG, up to 10 MB">
          {(field) => <Input {...field} {...register("file")} type="file" accept="application/pdf,image/png,image/jpeg" />}
        </FormField>
        {progress !== null ? <UploadProgress fraction={progress} /> : null}
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" pending={formState.isSubmitting}>
            Receive stock
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

function UploadProgress({ fraction }: { fraction: number }) {
  return (
    <div className="flex items-center gap-3">
      <progress className="h-2 w-full accent-rust" max={1} value={fraction} aria-label="Receipt upload" />
      <span className="text-sm tabular-nums text-muted">{Math.round(fraction * 100)} % uploaded</span>
    </div>
  );
}
