import type { ApiErrorCode } from "@takeup/domain";

export type ErrorDetail = { field: string; rule: string; message: string };

/** An error meant for the client: services throw it, the error handler renders it. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly details?: ErrorDetail[],
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const notFound = (what: string) => new HttpError(404, "not_found", `${what} was not found`);
export const conflict = (code: ApiErrorCode, message: string) => new HttpError(409, code, message);
