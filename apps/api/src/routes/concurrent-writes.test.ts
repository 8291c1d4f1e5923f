// Parallel writes that collide inside InnoDB (deadlocks, lock waits) are retried, never a 500;
// a unique key that is the real conflict answers 409.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
});
afterAll(() => t.close());

const statuses = (responses: { status: number }[]) => responses.map((r) => r.status).sort();

describe("parallel writes", () => {
  it("creates ten clients with contacts sent at the same moment, with no server error", async () => {
    const responses = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        owner.post("/api/clients").send({
          name: `Parallel Band ${i}`,
          kind: "band",
          contacts: [
            { name: `Singer ${i}`, email: `singer${i}@parallel.test`, isPrimary: true },
            { name: `Drummer ${i}`, phone: "+44 20 7946 0000" },
          ],
        }),
      ),
    );
    expect(statuses(responses)).toEqual(Array(10).fill(201));
  });

  it("answers ten parallel invitations to one address without a server error, leaving one pending (for each of three addresses)", async () => {
    // Where the address falls in the e-mail index decides whether InnoDB's gap locks collide,
    // so three addresses in different places.
    for (const email of ["aaron@parallel.test", "member1@parallel1.test", "zed@parallel.test"]) {
      const responses = await Promise.all(
        Array.from({ length: 10 }, (_, i) => owner.post("/api/staff/invitations").send({ name: `Session Player ${i}`, email, role: "engineer" })),
      );
      expect(responses.map((r) => r.status).filter((s) => s >= 500)).toEqual([]);
      const staff = await owner.get("/api/staff");
      expect(staff.body.invitations.filter((i: { email: string }) => i.email === email)).toHaveLength(1);
    }
  });

  it("answers ten parallel clients with one name as one 201 and nine 409 client_exists", async () => {
    const responses = await Promise.all(
      Array.from({ length: 10 }, () => owner.post("/api/clients").send({ name: "The Only One", kind: "band", contacts: [{ name: "Solo" }] })),
    );
    expect(statuses(responses)).toEqual([201, ...Array(9).fill(409)]);
    for (const r of responses.filter((x) => x.status === 409)) expect(r.body.error.code).toBe("client_exists");
  });
});
