import { useState, type FormEvent } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { scanReel } from "../api/reels.ts";

/** Type a label id or scan its QR code (a scanner types it in and presses Enter). */
export function ScanBox({ onFound }: { onFound: (reelId: number) => void }) {
  const [label, setLabel] = useState("");
  const [error, setError] = useState<string | undefined>();
  const [pending, setPending] = useState(false);
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!label.trim()) return;
    setPending(true);
    setError(undefined);
    try {
      const reel = await scanReel(label);
      onFound(reel.id);
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setPending(false);
    }
  };
  return (
    <form onSubmit={(e) => void submit(e)} className="flex flex-wrap items-end gap-2" role="search" aria-label="Find a reel by its label">
      <FormField label="Scan or type a label id" error={error} className="min-w-64 flex-1">
        {(control) => <Input {...control} value={label} onChange={(e) => setLabel(e.target.value)} placeholder="RL-000042-X" autoComplete="off" />}
      </FormField>
      <Button type="submit" variant="secondary" pending={pending}>
        Find reel
      </Button>
    </form>
  );
}
