import { APIError } from "better-auth";
import type { ApiErrorCode } from "@takeup/domain";
import { HttpError } from "./http-error.ts";

/** Turns a better-auth APIError into our error shape, keeping its status. */
export function fromAuthError(error: unknown, fallback: { code: ApiErrorCode; message: string }): never {
  if (error instanceof APIError) {
    const status = typeof error.statusCode === "number" ? error.statusCode : 400;
    const message = (error.body as { message?: string } | undefined)?.message;
    if (status === 403) throw new HttpError(403, "account_deactivated", message ?? "This sign-in has been deactivated");
    throw new HttpError(status >= 500 ? 502 : status, fallback.code, fallback.message);
  }
  throw error;
}
