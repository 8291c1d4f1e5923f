import { Router, type Request, type Response } from "express";
import { z } from "zod";
import type { Access, RouteContract } from "@takeup/domain";
import { requireRole } from "../middleware/require-role.ts";
import type { Actor } from "./actor.ts";
import { HttpError, type ErrorDetail } from "./http-error.ts";
import type { SessionReader } from "./session.ts";

type Schema = z.ZodType;
type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

export type RouteContext<P, Q, B, A extends Access> = {
  req: Request;
  res: Response;
  actor: A extends "public" ? null : Actor;
  params: Parsed<P>;
  query: Parsed<Q>;
  body: Parsed<B>;
};

/** A contract as mounted: its path relative to the router's base, and the handler behind it. */
type MountedRoute = Omit<RouteContract, "path"> & {
  /** Relative to the router's base, in Express syntax (`/:id`). */
  path: string;
  handler: (ctx: RouteContext<Schema | undefined, Schema | undefined, Schema | undefined, Access>) => Promise<unknown>;
};

export type RegisteredRoute = MountedRoute & {
  fullPath: string;
  tag: string;
};

type ContractContext<C extends RouteContract> = RouteContext<C["params"], C["query"], C["body"], C["access"]>;
type ContractAnswer<C extends RouteContract> = C["response"] extends Schema ? z.input<C["response"]> : unknown;

export type ToExpressOptions = {
  /** Parse every success answer with its declared schema (tests): contract drift becomes a 500 that names it. */
  checkResponses?: boolean;
};

/**
 * Mounts the routes declared in `@takeup/domain`'s contracts behind requireRole and their zod
 * schemas, and records each so the OpenAPI document and the access tests see it.
 */
export class ApiRouter {
  readonly routes: RegisteredRoute[] = [];

  constructor(
    readonly base: string,
    readonly tag: string,
  ) {}

  /** Mounts a route declared once in `@takeup/domain`'s contracts, which the web's fetchers share. */
  handle<const C extends RouteContract>(contract: C, handler: (ctx: ContractContext<C>) => Promise<ContractAnswer<C>>): this {
    if (contract.path !== this.base && !contract.path.startsWith(`${this.base}/`)) {
      throw new Error(`${contract.method.toUpperCase()} ${contract.path} does not belong under ${this.base}`);
    }
    const path = contract.path.slice(this.base.length) || "/";
    this.routes.push({ ...contract, path, handler: handler as RegisteredRoute["handler"], fullPath: this.base + path, tag: this.tag });
    return this;
  }

  toExpress(sessions: SessionReader, { checkResponses = false }: ToExpressOptions = {}): Router {
    const router = Router();
    for (const spec of this.routes) {
      router[spec.method](spec.path, requireRole(sessions, spec.access), async (req, res) => {
        refuseUnpairedSurrogates({ ...req.params }, req.query, req.body);
        const ctx = {
          req,
          res,
          actor: (res.locals.actor as Actor | undefined) ?? null,
          params: spec.params ? spec.params.parse(req.params) : undefined,
          query: spec.query ? spec.query.parse(req.query) : undefined,
          body: spec.body ? spec.body.parse(req.body) : undefined,
        };
        const result = await spec.handler(ctx as never);
        if (spec.response === "file" || res.headersSent) return;
        if (result === undefined) {
          res.status(spec.status ?? 204).end();
          return;
        }
        // A handler may pick its own status (health answers 503 with a body).
        const status = res.statusCode !== 200 ? res.statusCode : (spec.status ?? 200);
        if (checkResponses && status < 300) assertAnswerKeepsContract(spec, result);
        res.status(status).json(result);
      });
    }
    return router;
  }
}

function assertAnswerKeepsContract(spec: RegisteredRoute, result: unknown) {
  if (!spec.response || spec.response === "file") {
    throw new HttpError(500, "contract_drift", `${spec.method.toUpperCase()} ${spec.fullPath} answered a body but declares none`);
  }
  // Round-trip through JSON first: the client sees dates as strings, not Date objects.
  const parsed = spec.response.safeParse(JSON.parse(JSON.stringify(result)));
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".") || "(body)"}: ${i.message}`).join("; ");
    throw new HttpError(500, "contract_drift", `${spec.method.toUpperCase()} ${spec.fullPath} broke its response contract: ${problems}`);
  }
}

const unpairedSurrogate = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
// No contract nests deeper than a few levels; this also keeps the walk's recursion shallow.
const maxDepth = 32;

/**
 * JSON may carry "\ud800", half of a UTF-16 pair: not text, and MariaDB's utf8mb4 cannot store it
 * (the driver would quietly write U+FFFD). One check for every route, before any schema runs.
 */
export function refuseUnpairedSurrogates(...inputs: unknown[]) {
  const details: ErrorDetail[] = [];
  const visit = (value: unknown, path: string[]) => {
    if (details.length >= 20) return;
    if (path.length > maxDepth) {
      details.push({ field: path.slice(0, 3).join(".") + "…", rule: "too_deep", message: `Nest at most ${maxDepth} levels` });
    } else if (typeof value === "string") {
      if (unpairedSurrogate.test(value)) {
        details.push({
          field: path.join(".") || "(body)",
          rule: "unpaired_surrogate",
          message: "Contains half of a UTF-16 character pair, which is not valid text",
        });
      }
    } else if (Array.isArray(value)) {
      value.forEach((item, i) => visit(item, [...path, String(i)]));
    } else if (value && typeof value === "object") {
      for (const [key, item] of Object.entries(value)) {
        visit(key, path);
        visit(item, [...path, key]);
      }
    }
  };
  for (const input of inputs) visit(input, []);
  if (details.length > 0) {
    throw new HttpError(400, "invalid_input", `Check the request: ${details.map((d) => `${d.field}: ${d.message}`).join("; ")}`, details);
  }
}
