import { useId, useRef, useState } from "react";
import { Button } from "../../../components/ui/button.tsx";

/** A new feed's address, shown this once, with a button to copy it. */
export function FeedAddress({ url }: { url: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [copied, setCopied] = useState<"yes" | "select" | null>(null);

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied("yes");
    } catch {
      // No clipboard (an insecure page, or permission refused): select it for the person to copy.
      input.current?.select();
      setCopied("select");
    }
  };

  return (
    <div className="flex flex-col gap-2 rounded-md border border-rust/30 bg-rust-wash px-3 py-3">
      <label htmlFor={id} className="text-sm font-semibold">
        Feed address
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        <input
          ref={input}
          id={id}
          readOnly
          value={url}
          onFocus={(event) => event.target.select()}
          className="h-9 min-w-0 flex-1 rounded-md border border-line-strong bg-card px-2.5 font-mono text-xs"
        />
        <Button size="sm" className="h-9" onClick={() => void copy()}>
          {copied === "yes" ? "Copied" : "Copy address"}
        </Button>
      </div>
      <p className="text-sm text-ink" role="status">
        {copied === "select" ? "Press Ctrl+C (or ⌘C) to copy the selected address. " : null}
        Copy it now: Takeup keeps only a fingerprint of it and cannot show it again. Paste it into your calendar app as a subscription.
      </p>
    </div>
  );
}
