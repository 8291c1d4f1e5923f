import type { z } from "zod";
import type { Role } from "../auth/roles.ts";

/** Who may call a route: anyone, anyone signed in, or the listed roles (docs/roles.md). */
export type Access = "public" | "signed-in" | readonly Role[];

export type HttpMethod = "get" | "post" | "patch" | "put" | "delete";

type Schema = z.ZodType;

/**
 * One API route, declared once for both sides: the API mounts it (access, validation, OpenAPI,
 * and in tests a check of every answer against `response`), and the web derives its fetcher from it.
 */
export type RouteContract = {
  method: HttpMethod;
  /** The full path in Express syntax, e.g. `/api/clients/:id`. */
  path: string;
  summary: string;
  access: Access;
  params?: Schema;
  query?: Schema;
  body?: Schema;
  /** The success body; `file` means the handler streams a download itself. */
  response?: Schema | "file";
  /** The success status when it is not 200 (201 for creations, 204 without a body). */
  status?: number;
};

/** Declares a route contract, keeping its literal types for both sides. */
export const defineRoute = <const C extends RouteContract>(contract: C): C => contract;

type Input<S> = S extends Schema ? z.input<S> : never;
type Output<S> = S extends Schema ? z.output<S> : undefined;

/** What a caller sends: only the parts the route declares, typed by its schemas. */
export type RouteInput<C extends RouteContract> = (C["params"] extends Schema ? { params: Input<C["params"]> } : { params?: never }) &
  (C["query"] extends Schema ? { query: Input<C["query"]> } : { query?: never }) &
  (C["body"] extends Schema ? { body: Input<C["body"]> } : { body?: never });

/** What a route answers with on success. */
export type RouteResponse<C extends RouteContract> = C["response"] extends Schema ? Output<C["response"]> : undefined;

/** The route's URL with its path parameters filled in (encoded) and its query appended. */
export function routeUrl(path: string, params?: Record<string, unknown>, query?: Record<string, unknown>): string {
  const filled = path.replace(/:([A-Za-z]\w*)/g, (_, name: string) => {
    const value = params?.[name];
    if (value === undefined || value === null) throw new Error(`${path} needs the path parameter ${name}`);
    return encodeURIComponent(String(value));
  });
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null) continue;
    for (const item of Array.isArray(value) ? value : [value]) search.append(key, String(item));
  }
  const text = search.toString();
  return text ? `${filled}?${text}` : filled;
}
