import type { z } from "zod";
import { apiErrorDto, routeUrl, type ApiErrorDto, type RouteContract, type RouteInput, type RouteResponse } from "@takeup/domain";

export type ApiErrorDetail = NonNullable<ApiErrorDto["error"]["details"]>[number];

/** Every failed request becomes one of these, so screens handle a single error shape. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: ApiErrorDetail[];

  constructor(status: number, code: string, message: string, details: ApiErrorDetail[] = []) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

/** What to tell a person about any error, whether or not it came from the API. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return "Something went wrong. Try again in a moment.";
}

type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";

type RequestOptions<T> = {
  method?: Method;
  body?: unknown;
  /** Checks the answer against the shared contract, so drift shows up as an error, not as odd screens. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
};

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === "") return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The ApiError a failed response stands for (our error shape, or a readable stand-in). */
export async function apiErrorOf(response: Response): Promise<ApiError> {
  return toApiError(response.status, await readJson(response));
}

function toApiError(status: number, body: unknown): ApiError {
  const parsed = apiErrorDto.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(status, code, message, details);
  }
  return new ApiError(status, "unexpected_response", `The server answered with an error (${status}). Try again in a moment.`);
}

async function apiRequest<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = "GET", body, schema, signal } = options;
  const headers: Record<string, string> = { accept: "application/json" };
  if (body !== undefined) headers["content-type"] = "application/json";

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: "same-origin",
      signal,
    });
  } catch (error) {
    // React Query cancels by aborting; that is not a failure to report.
    if (error instanceof DOMException && error.name === "AbortError") throw error;
    throw new ApiError(0, "network_error", "Takeup could not reach the server. Check the connection and try again.");
  }

  const data = await readJson(response);
  if (!response.ok) throw toApiError(response.status, data);
  if (!schema) return data as T;
  const parsed = schema.safeParse(data);
  if (!parsed.success) {
    throw new ApiError(response.status, "unexpected_response", "The server sent an answer Takeup did not expect.");
  }
  return parsed.data;
}

type CallOptions<C extends RouteContract> = RouteInput<C> & { signal?: AbortSignal };
type CallArgs<C extends RouteContract> = object extends RouteInput<C> ? [options?: CallOptions<C>] : [options: CallOptions<C>];

/**
 * Calls the route a shared contract declares: the path, its parameters, the query and the body
 * are typed by that contract, and the answer is parsed with its response schema.
 */
export function callApi<const C extends RouteContract>(contract: C, ...[options]: CallArgs<C>): Promise<RouteResponse<C>> {
  const { params, query, body, signal } = (options ?? {}) as { params?: Record<string, unknown>; query?: Record<string, unknown>; body?: unknown; signal?: AbortSignal };
  const schema = contract.response && contract.response !== "file" ? (contract.response as z.ZodType<RouteResponse<C>>) : undefined;
  return apiRequest<RouteResponse<C>>(routeUrl(contract.path, params, query), {
    method: contract.method.toUpperCase() as Method,
    body,
    schema,
    signal,
  });
}
