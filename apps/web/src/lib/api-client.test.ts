import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { clientRoutes, defineRoute, meRoutes, staffRoutes, studioRoutes } from "@takeup/domain";
import { ApiError, callApi } from "./api-client.ts";
import { mockApi } from "../test/mock-api.ts";

describe("api client", () => {
  it("turns an error response into an ApiError with its status, code, message and details", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/staff/invitations",
        reply: {
          status: 400,
          body: {
            error: {
              code: "invalid_input",
              message: "Check the request: email: Enter a valid e-mail address",
              details: [{ field: "email", rule: "invalid_format", message: "Enter a valid e-mail address" }],
            },
          },
        },
      },
    ]);

    const failure = await callApi(staffRoutes.invite, { body: { name: "Ada", email: "nope", role: "engineer" } }).catch((error: unknown) => error);

    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({
      status: 400,
      code: "invalid_input",
      message: "Check the request: email: Enter a valid e-mail address",
      details: [{ field: "email", rule: "invalid_format", message: "Enter a valid e-mail address" }],
    });
  });

  it("sends JSON with the session cookie of our own origin", async () => {
    const { calls, fetchMock } = mockApi([{ method: "PATCH", path: "/api/studio", reply: { body: { ok: true } } }]);

    const rename = defineRoute({
      method: "patch",
      path: "/api/studio",
      summary: "A route declared for this test",
      access: ["owner"],
      body: z.object({ name: z.string() }),
      response: z.object({ ok: z.literal(true) }),
    });

    await expect(callApi(rename, { body: { name: "Wrenfield Sound" } })).resolves.toEqual({ ok: true });

    expect(calls).toEqual([{ method: "PATCH", path: "/api/studio", body: { name: "Wrenfield Sound" }, credentials: "same-origin" }]);
    const init = fetchMock.mock.calls[0]?.[1];
    expect(init?.headers).toMatchObject({ "content-type": "application/json" });
  });

  it("reports an unreachable server as a network error, not a crash", async () => {
    vi.stubGlobal("fetch", vi.fn(() => Promise.reject(new TypeError("Failed to fetch"))));

    await expect(callApi(meRoutes.get)).rejects.toMatchObject({ status: 0, code: "network_error" });
  });

  it("refuses an answer that does not match the shared contract", async () => {
    mockApi([{ method: "GET", path: "/api/studio", reply: { body: { name: 42 } } }]);

    await expect(callApi(studioRoutes.get)).rejects.toMatchObject({ code: "unexpected_response" });
  });

  it("gives a readable error when the server answers with something that is not our error shape", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => new Response("<html>Bad gateway</html>", { status: 502 })));

    await expect(callApi(clientRoutes.list)).rejects.toMatchObject({ status: 502, code: "unexpected_response" });
  });
});
