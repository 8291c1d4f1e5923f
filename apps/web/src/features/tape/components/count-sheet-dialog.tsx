import { useState } from "react";
import type { TapeProductDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { usePostCount } from "../api/move-tape.ts";

/** Counted quantities for every product, the differences beside them, posted as adjustments in one go. */
export function CountSheetDialog({ products, onClose }: { products: TapeProductDto[]; onClose: () => void }) {
  const toast = useToast();
  const post = usePostCount();
  const [counts, setCounts] = useState<Record<number, string>>({});
  const [reason, setReason] = useState("Stock count");
  const [formError, setFormError] = useState<string | null>(null);
  const counted = (p: TapeProductDto) => (/^\d{1,5}$/.test(counts[p.id] ?? "") ? Number(counts[p.id]) : null);
  const lines = products.flatMap((p) => {
    const c = counted(p);
    return c === null ? [] : [{ productId: p.id, counted: c }];
  });
  const changes = products.filter((p) => counted(p) !== null && counted(p) !== p.onHand).length;
  const submit = async () => {
    setFormError(null);
    try {
      const result = await post.mutateAsync({ lines, reason });
      toast(result.adjustments.length === 0 ? "The count matched: nothing to adjust" : `${result.adjustments.length} adjustment${result.adjustments.length === 1 ? "" : "s"} posted`);
      onClose();
    } catch (error) {
      setFormError(errorMessage(error));
    }
  };
  return (
    <Dialog open onClose={onClose} title="Count sheet" description="Enter what is on the shelf; products left empty are not counted." size="lg">
      <div className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <table className="w-full text-sm">
          <thead className="text-left text-muted">
            <tr>
              <th className="py-1 pr-3 font-medium">Product</th>
              <th className="py-1 pr-3 text-right font-medium">On hand</th>
              <th className="py-1 pr-3 font-medium">Counted</th>
              <th className="py-1 text-right font-medium">Difference</th>
            </tr>
          </thead>
          <tbody>
            {products.map((p) => {
              const c = counted(p);
              const difference = c === null ? null : c - p.onHand;
              return (
                <tr key={p.id} className="border-t border-line">
                  <td className="py-1.5 pr-3">{p.name}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{p.onHand}</td>
                  <td className="py-1.5 pr-3">
                    <Input aria-label={`Counted ${p.name}`} className="w-24" inputMode="numeric" value={counts[p.id] ?? ""} onChange={(e) => setCounts({ ...counts, [p.id]: e.target.value })} />
                  </td>
                  <td className="py-1.5 text-right tabular-nums">{difference === null ? "—" : difference > 0 ? `+${difference}` : difference}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <FormField label="Reason">{(field) => <Input {...field} value={reason} maxLength={480} onChange={(e) => setReason(e.target.value)} />}</FormField>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button onClick={() => void submit()} pending={post.isPending} disabled={lines.length === 0 || reason.trim() === ""}>
            {changes === 0 ? "Post count" : `Post ${changes} adjustment${changes === 1 ? "" : "s"}`}
          </Button>
        </DialogActions>
      </div>
    </Dialog>
  );
}
