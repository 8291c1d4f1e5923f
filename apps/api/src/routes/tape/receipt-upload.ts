import { randomBytes } from "node:crypto";
import { mkdirSync } from "node:fs";
import { rm } from "node:fs/promises";
import path from "node:path";
import type { Request, Response } from "express";
import multer from "multer";
import { fileTypeFromFile } from "file-type";
import { HttpError } from "../../lib/http-error.ts";
import { refuseUnpairedSurrogates } from "../../lib/api-router.ts";

export const maxReceiptBytes = 10 * 1024 * 1024;
/** Receipts are PDF, PNG or JPEG, told by their first bytes, never by name or the browser's word. */
export const receiptTypes = new Map([
  ["application/pdf", "pdf"],
  ["image/png", "png"],
  ["image/jpeg", "jpg"],
]);

export type StoredUpload = { storedName: string; fullPath: string; originalName: string; contentType: string; bytes: number };

/**
 * Reads a multipart receipt form to disk under `dir` with a random name. Answers the text fields
 * and the file (checked by content); on any refusal the file is already gone when it throws.
 */
export function receiptUploader(dir: string) {
  mkdirSync(dir, { recursive: true });
  const upload = multer({
    storage: multer.diskStorage({
      destination: dir,
      filename: (_req, _file, done) => done(null, `${randomBytes(18).toString("base64url")}.upload`),
    }),
    limits: { fileSize: maxReceiptBytes, files: 1, fields: 10, fieldSize: 2000, parts: 12, headerPairs: 100 },
  }).single("file");

  return async function readReceiptForm(req: Request, res: Response): Promise<{ fields: Record<string, unknown>; file: StoredUpload | null }> {
    await new Promise<void>((resolve, reject) => {
      upload(req, res, (error: unknown) => (error ? reject(uploadError(error)) : resolve()));
    });
    const file = req.file;
    // express.json() may already have read a JSON body; multipart fields arrive as strings.
    const fields = req.is("multipart/form-data") ? { ...(req.body as Record<string, unknown>) } : ((req.body ?? {}) as Record<string, unknown>);
    if (!file) return { fields, file: null };
    try {
      refuseUnpairedSurrogates(fields, file.originalname);
      const sniffed = await fileTypeFromFile(file.path);
      if (!sniffed || !receiptTypes.has(sniffed.mime)) {
        throw new HttpError(400, "unsupported_file_type", "Attach the receipt as a PDF, PNG or JPEG file", [
          { field: "file", rule: "file_type", message: `The file's content is ${sniffed ? sniffed.mime : "not a recognised type"}; use PDF, PNG or JPEG` },
        ]);
      }
      return {
        fields,
        file: {
          storedName: path.basename(file.path),
          fullPath: file.path,
          originalName: (file.originalname || "receipt").slice(0, 255),
          contentType: sniffed.mime,
          bytes: file.size,
        },
      };
    } catch (error) {
      await rm(file.path, { force: true });
      throw error;
    }
  };
}

/** multer's and busboy's own errors, as our 4xx answers (a file multer has begun is removed by multer). */
function uploadError(error: unknown): unknown {
  if (error instanceof multer.MulterError) {
    if (error.code === "LIMIT_FILE_SIZE") {
      return new HttpError(413, "file_too_large", "The receipt is larger than 10 MB", [{ field: "file", rule: "max_size", message: "Attach a file of 10 MB or less" }]);
    }
    const field = error.field ?? "(body)";
    return new HttpError(400, "invalid_upload", `The upload was refused: ${error.message}`, [
      { field, rule: error.code.toLowerCase(), message: error.code === "LIMIT_UNEXPECTED_FILE" ? "Send one file, in the field named file" : error.message },
    ]);
  }
  if (error instanceof HttpError) return error;
  return new HttpError(400, "unreadable_body", "The upload could not be read; send it as multipart/form-data", [
    { field: "(body)", rule: "multipart", message: error instanceof Error ? error.message : "Malformed multipart body" },
  ]);
}
