import { describe, expect, it } from "vitest";
import { readConfig } from "./config.ts";

const required = { DATABASE_URL: "mysql://takeup:pw@127.0.0.1:3307/takeup", AUTH_SECRET: "s".repeat(32) };

describe("readConfig", () => {
  it("listens on loopback only unless HOST says otherwise", () => {
    expect(readConfig(required).host).toBe("127.0.0.1");
  });

  it("listens on the interface HOST names", () => {
    expect(readConfig({ ...required, HOST: "0.0.0.0" }).host).toBe("0.0.0.0");
    expect(readConfig({ ...required, HOST: "::1" }).host).toBe("::1");
  });

  it("refuses an empty HOST", () => {
    expect(() => readConfig({ ...required, HOST: " " })).toThrow(/HOST/);
  });
});
