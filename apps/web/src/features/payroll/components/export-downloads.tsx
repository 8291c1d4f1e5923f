import { useEffect, useRef, useState } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { downloadPayPeriodExport, saveFile, type ExportFormat } from "../api/download-pay-period-export.ts";

type Progress =
  | { state: "idle" }
  | { state: "downloading"; format: ExportFormat; bytes: number }
  | { state: "saved"; filename: string; bytes: number };

/** 412 KB, 1.3 MB; under a kilobyte, bytes. */
export function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

const labels: Record<ExportFormat, string> = { xlsx: "Download XLSX", csv: "Download CSV" };

/** The period's payroll export, read as it streams so a long file shows how far it has got. */
export function ExportDownloads({ periodId }: { periodId: number }) {
  const toast = useToast();
  const [progress, setProgress] = useState<Progress>({ state: "idle" });
  const controller = useRef<AbortController | null>(null);

  // Leaving the page stops a download nobody is waiting for.
  useEffect(() => () => controller.current?.abort(), []);

  const download = async (format: ExportFormat) => {
    const abort = new AbortController();
    controller.current = abort;
    setProgress({ state: "downloading", format, bytes: 0 });
    try {
      const file = await downloadPayPeriodExport(periodId, format, {
        signal: abort.signal,
        onProgress: (bytes) => setProgress({ state: "downloading", format, bytes }),
      });
      saveFile(file);
      setProgress({ state: "saved", filename: file.filename, bytes: file.bytes });
    } catch (error) {
      if (abort.signal.aborted) return;
      setProgress({ state: "idle" });
      toast(errorMessage(error), "error");
    } finally {
      if (controller.current === abort) controller.current = null;
    }
  };

  const busy = progress.state === "downloading";
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        {(["xlsx", "csv"] as const).map((format) => (
          <Button
            key={format}
            variant="secondary"
            onClick={() => void download(format)}
            disabled={busy}
            pending={busy && progress.format === format}
          >
            {labels[format]}
          </Button>
        ))}
      </div>
      <p role="status" className="min-h-5 text-sm text-muted tabular-nums">
        {progress.state === "downloading"
          ? `Downloading… ${formatSize(progress.bytes)}`
          : progress.state === "saved"
            ? `Saved ${progress.filename} (${formatSize(progress.bytes)})`
            : ""}
      </p>
    </div>
  );
}
