import { payrollRoutes, routeUrl } from "@takeup/domain";
import { ApiError, apiErrorOf } from "../../../lib/api-client.ts";

export type ExportFormat = "xlsx" | "csv";
export type ExportFile = { blob: Blob; filename: string; bytes: number };

const mimeTypes: Record<ExportFormat, string> = {
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
  csv: "text/csv",
};

/** The name from `attachment; filename="…"` (or the RFC 6266 `filename*=UTF-8''…` form). */
export function filenameFromDisposition(header: string | null): string | null {
  if (!header) return null;
  const extended = /filename\*\s*=\s*(?:UTF-8|utf-8)''([^;]+)/.exec(header);
  if (extended?.[1]) {
    try {
      return decodeURIComponent(extended[1].trim());
    } catch {
      // Fall through to the plain form.
    }
  }
  const plain = /filename\s*=\s*(?:"([^"]*)"|([^;]+))/.exec(header);
  const name = (plain?.[1] ?? plain?.[2])?.trim();
  // Only a name, never a path.
  return name ? (name.split(/[\\/]/).pop() ?? null) : null;
}

/**
 * Fetches a period's export and reads it as it streams (the server sends no Content-Length),
 * telling `onProgress` the bytes received so far. The caller saves the file.
 */
export async function downloadPayPeriodExport(
  id: number,
  format: ExportFormat,
  { onProgress, signal }: { onProgress?: (bytes: number) => void; signal?: AbortSignal } = {},
): Promise<ExportFile> {
  let response: Response;
  try {
    response = await fetch(routeUrl(payrollRoutes.exportPeriod.path, { id }, { format }), { credentials: "same-origin", signal });
  } catch (error) {
    if (error instanceof DOMException && error.name === "AbortError") throw error;
    throw new ApiError(0, "network_error", "Takeup could not reach the server. Check the connection and try again.");
  }
  if (!response.ok) throw await apiErrorOf(response);

  const filename = filenameFromDisposition(response.headers.get("content-disposition")) ?? `takeup-payroll-${id}.${format}`;
  const type = response.headers.get("content-type")?.split(";")[0]?.trim() || mimeTypes[format];
  onProgress?.(0);
  if (!response.body) {
    const blob = await response.blob();
    onProgress?.(blob.size);
    return { blob: new Blob([blob], { type }), filename, bytes: blob.size };
  }

  const reader = response.body.getReader();
  const chunks: Uint8Array<ArrayBuffer>[] = [];
  let bytes = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      // A copy on its own buffer: safe to keep after the stream reuses its memory, and a valid BlobPart.
      chunks.push(new Uint8Array(value));
      bytes += value.byteLength;
      onProgress?.(bytes);
    }
  } catch (error) {
    if (error instanceof DOMException && error.name === "AbortError") throw error;
    throw new ApiError(0, "network_error", "The download stopped before the file was complete. Try again.");
  } finally {
    reader.releaseLock();
  }
  return { blob: new Blob(chunks, { type }), filename, bytes };
}

/** Hands a downloaded file to the browser to save, through a short-lived Blob URL. */
export function saveFile({ blob, filename }: Pick<ExportFile, "blob" | "filename">) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement("a");
  link.href = url;
  link.download = filename;
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  // Revoked on the next tick: the click has started the download by then.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
