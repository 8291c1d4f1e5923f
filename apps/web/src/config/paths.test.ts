import { describe, expect, it } from "vitest";
import { paths, safeNext } from "./paths.ts";

describe("paths", () => {
  it("keeps where the person was going in the sign-in link", () => {
    expect(paths.signIn.getHref("/clients?page=2")).toBe("/sign-in?next=%2Fclients%3Fpage%3D2");
    expect(paths.clients.detail.getHref(7)).toBe("/clients/7");
  });

  it("only follows our own paths after sign-in, never another site", () => {
    expect(safeNext("/team")).toBe("/team");
    expect(safeNext("https://elsewhere.test/")).toBe("/");
    expect(safeNext("//elsewhere.test")).toBe("/");
    expect(safeNext("/\\elsewhere.test")).toBe("/");
    expect(safeNext(null)).toBe("/");
  });
});
