import { vi } from "vitest";

type Reply = { status?: number; body?: unknown };
type Route = {
  method: "GET" | "POST" | "PATCH" | "DELETE";
  path: string | RegExp;
  reply: Reply | ((request: { body: unknown }) => Reply);
};

export type RecordedCall = { method: string; path: string; body: unknown; credentials: RequestCredentials | undefined };

const json = (status: number, body: unknown) =>
  new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { "content-type": "application/json" },
  });

/**
 * Stands in for the API: answers from the given routes and records every call, so tests can
 * check the exact request a screen sent. Unknown calls answer 404 so they are never silent.
 */
export function mockApi(routes: Route[]) {
  const calls: RecordedCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), "http://takeup.test");
    const method = init?.method ?? "GET";
    const body = typeof init?.body === "string" ? (JSON.parse(init.body) as unknown) : undefined;
    calls.push({ method, path: url.pathname + url.search, body, credentials: init?.credentials });
    const route = routes.find(
      (r) => r.method === method && (typeof r.path === "string" ? r.path === url.pathname : r.path.test(url.pathname)),
    );
    if (!route) return json(404, { error: { code: "not_found", message: `No mock for ${method} ${url.pathname}` } });
    const reply = typeof route.reply === "function" ? route.reply({ body }) : route.reply;
    return json(reply.status ?? 200, reply.body);
  });
  vi.stubGlobal("fetch", fetchMock);
  return { calls, fetchMock };
}
