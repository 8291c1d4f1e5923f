import { z } from "zod";
import { apiErrorDto } from "@takeup/domain";
import type { RegisteredRoute } from "./api-router.ts";

const toOpenApiPath = (path: string) => path.replace(/\/$/, "").replace(/:([A-Za-z]+)/g, "{$1}") || "/";

function jsonSchema(schema: z.ZodType, io: "input" | "output") {
  return z.toJSONSchema(schema, { io, unrepresentable: "any" }) as Record<string, unknown>;
}

/** OpenAPI 3.1 built from the same zod contracts that validate the requests. */
export function buildOpenApi(routes: RegisteredRoute[]) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const route of routes) {
    const parameters: unknown[] = [];
    for (const [where, schema] of [["path", route.params], ["query", route.query]] as const) {
      if (!schema) continue;
      const json = jsonSchema(schema, "input") as { properties?: Record<string, unknown>; required?: string[] };
      for (const [name, property] of Object.entries(json.properties ?? {})) {
        parameters.push({ name, in: where, required: where === "path" || (json.required ?? []).includes(name), schema: property });
      }
    }
    const status = String(route.status ?? (route.response ? 200 : 204));
    const access = route.access === "public" ? "anyone" : route.access === "signed-in" ? "any signed-in role" : route.access.join(", ");
    const operation = {
      operationId: `${route.method}${toOpenApiPath(route.fullPath).replace(/[{}]/g, "").replace(/[/-](\w)/g, (_, c: string) => c.toUpperCase())}`,
      tags: [route.tag],
      summary: route.summary,
      description: `Who may call it: ${access}.`,
      "x-access": route.access,
      ...(parameters.length ? { parameters } : {}),
      ...(route.body ? { requestBody: { required: true, content: { "application/json": { schema: jsonSchema(route.body, "input") } } } } : {}),
      responses: {
        [status]: route.response === "file"
          ? { description: "A file download" }
          : route.response
            ? { description: "Success", content: { "application/json": { schema: jsonSchema(route.response, "output") } } }
            : { description: "Done" },
        default: { description: "An error", content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } },
      },
    };
    paths[toOpenApiPath(route.fullPath)] = { ...paths[toOpenApiPath(route.fullPath)], [route.method]: operation };
  }
  return {
    openapi: "3.1.0",
    info: { title: "Takeup API", version: "0.1.0", description: "The back office of a recording studio." },
    paths,
    components: {
      schemas: {
        // The one error shape every route answers with, from the same contract the web parses.
        Error: jsonSchema(apiErrorDto, "output"),
      },
    },
  };
}
