import { describe, expect, it } from "vitest";
import { routeUrl } from "./route.ts";

describe("routeUrl", () => {
  it("fills path parameters, encoding each one", () => {
    expect(routeUrl("/api/clients/:id/users/:userId", { id: 4, userId: "a/b c" })).toBe("/api/clients/4/users/a%2Fb%20c");
  });

  it("appends the query, skipping absent values and repeating lists", () => {
    expect(routeUrl("/api/bookings", undefined, { from: "2026-12-01", room: [1, 2], status: undefined })).toBe(
      "/api/bookings?from=2026-12-01&room=1&room=2",
    );
  });

  it("refuses to build a URL with a parameter missing", () => {
    expect(() => routeUrl("/api/clients/:id", {})).toThrow(/needs the path parameter id/);
  });
});
