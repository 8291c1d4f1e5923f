import { screen } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { renderWithApp } from "../../../test/render.tsx";
import { filenameFromDisposition } from "../api/download-pay-period-export.ts";
import { ExportDownloads } from "./export-downloads.tsx";

const kb = (n: number) => new Uint8Array(n * 1024);

let saved: { blob: Blob; name: string } | null = null;
let click: { mockRestore: () => void } | null = null;
const { createObjectURL, revokeObjectURL } = URL;

beforeEach(() => {
  saved = null;
  let lastBlob: Blob | null = null;
  // jsdom has no Blob URLs.
  URL.createObjectURL = (blob: Blob) => {
    lastBlob = blob;
    return "blob:takeup/1";
  };
  URL.revokeObjectURL = () => undefined;
  // jsdom cannot navigate; the click is where the browser would save the file.
  click = vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
    if (lastBlob) saved = { blob: lastBlob, name: this.download };
  });
});

afterEach(() => {
  click?.mockRestore();
  URL.createObjectURL = createObjectURL;
  URL.revokeObjectURL = revokeObjectURL;
});

describe("ExportDownloads", () => {
  it("streams the export, reporting the kilobytes received, then saves it under the server's file name", async () => {
    let stream!: ReadableStreamDefaultController<Uint8Array>;
    const body = new ReadableStream<Uint8Array>({
      start(controller) {
        stream = controller;
      },
    });
    const fetchMock = vi.fn(async () =>
      new Response(body, {
        status: 200,
        headers: {
          "content-type": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
          "content-disposition": 'attachment; filename="takeup-payroll-2026-11-30_2026-12-06.xlsx"',
        },
      }),
    );
    vi.stubGlobal("fetch", fetchMock);
    const { user } = renderWithApp(<ExportDownloads periodId={9} />);

    await user.click(screen.getByRole("button", { name: "Download XLSX" }));
    expect(await screen.findByText("Downloading… 0 bytes")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Download CSV" })).toBeDisabled();

    stream.enqueue(kb(300));
    expect(await screen.findByText("Downloading… 300 KB")).toBeInTheDocument();
    stream.enqueue(kb(112));
    expect(await screen.findByText("Downloading… 412 KB")).toBeInTheDocument();
    stream.close();

    expect(await screen.findByText("Saved takeup-payroll-2026-11-30_2026-12-06.xlsx (412 KB)")).toBeInTheDocument();
    expect(fetchMock).toHaveBeenCalledWith("/api/pay-periods/9/export?format=xlsx", expect.objectContaining({ credentials: "same-origin" }));
    expect(saved?.name).toBe("takeup-payroll-2026-11-30_2026-12-06.xlsx");
    expect(saved?.blob.size).toBe(412 * 1024);
    expect(saved?.blob.type).toBe("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    expect(screen.getByRole("button", { name: "Download CSV" })).toBeEnabled();
  });

  it("shows the API's refusal instead of saving anything", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () =>
        Response.json({ error: { code: "forbidden", message: "Only the owner and the bookkeeper export payroll" } }, { status: 403 }),
      ),
    );
    const { user } = renderWithApp(<ExportDownloads periodId={9} />);

    await user.click(screen.getByRole("button", { name: "Download CSV" }));
    expect(await screen.findByText("Only the owner and the bookkeeper export payroll")).toBeInTheDocument();
    expect(saved).toBeNull();
  });

  it("reads the file name from either form of Content-Disposition", () => {
    expect(filenameFromDisposition('attachment; filename="takeup-payroll-2026-11-30_2026-12-06.csv"')).toBe("takeup-payroll-2026-11-30_2026-12-06.csv");
    expect(filenameFromDisposition("attachment; filename*=UTF-8''pay%20period.csv")).toBe("pay period.csv");
    expect(filenameFromDisposition('attachment; filename="../../etc/passwd"')).toBe("passwd");
    expect(filenameFromDisposition(null)).toBeNull();
  });
});
