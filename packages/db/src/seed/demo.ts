// The invented "Wrenfield Sound" studio of the product brief. Demo data only.
import { generateId } from "better-auth";
import { hashPassword } from "better-auth/crypto";
import type { ClientKind, StaffRole } from "@takeup/domain";
import type { Db, Tx } from "../client.ts";
import { seedStudioFloor } from "./demo-studio-floor.ts";
import { seedTime } from "./demo-time.ts";
import { seedTape } from "./demo-tape.ts";
import { seedInvoices } from "./demo-invoices.ts";
import { seedVault } from "./demo-vault.ts";
import { account, clientAccounts, clientContacts, clientUsers, staffProfiles, studio, user } from "../schema/index.ts";

export const demoPassword = "studio-demo-2026";

export const demoStudio = {
  id: 1,
  name: "Wrenfield Sound",
  timeZone: "America/Chicago",
  currency: "USD",
  workweekStartDay: 1,
  address: "14 Mill Race Lane, Wrenfield",
  email: "hello@wrenfield.test",
  phone: "555-0142",
};

export const demoStaff: { email: string; name: string; role: StaffRole }[] = [
  { email: "owner@wrenfield.test", name: "Mara Linden", role: "owner" },
  { email: "manager@wrenfield.test", name: "Theo Vance", role: "manager" },
  { email: "priya@wrenfield.test", name: "Priya Oduya", role: "engineer" },
  { email: "sam@wrenfield.test", name: "Sam Reyes", role: "engineer" },
  { email: "jo@wrenfield.test", name: "Jo Kettering", role: "engineer" },
  { email: "books@wrenfield.test", name: "Lena Marsh", role: "bookkeeper" },
];

type DemoClient = {
  name: string;
  kind: ClientKind;
  email: string;
  phone: string;
  contacts: { name: string; email?: string; phone?: string; note?: string }[];
  user?: { email: string; name: string };
};

export const demoClients: DemoClient[] = [
  {
    name: "Lantern Static",
    kind: "band",
    email: "band@lanternstatic.test",
    phone: "555-0181",
    contacts: [
      { name: "Rosa Delacourt", email: "rosa@lanternstatic.test", phone: "555-0182", note: "Singer, books the sessions" },
      { name: "Abe Thornbury", email: "abe@lanternstatic.test", note: "Drums" },
    ],
    user: { email: "band@lanternstatic.test", name: "Rosa Delacourt" },
  },
  {
    name: "The Quiet Orchard",
    kind: "band",
    email: "band@quietorchard.test",
    phone: "555-0190",
    contacts: [{ name: "Wendell Ashby", email: "wendell@quietorchard.test", note: "Guitar, band manager" }],
    user: { email: "band@quietorchard.test", name: "Wendell Ashby" },
  },
  {
    name: "Copper Vale",
    kind: "band",
    email: "hello@coppervale.test",
    phone: "555-0133",
    contacts: [{ name: "Nell Brightwater", email: "nell@coppervale.test", note: "Bass" }],
  },
  {
    name: "Ines Halloran",
    kind: "producer",
    email: "ines@halloran.test",
    phone: "555-0167",
    contacts: [{ name: "Ines Halloran", email: "ines@halloran.test", note: "Producer" }],
  },
  {
    name: "Blue Hour Records",
    kind: "label",
    email: "accounts@bluehour.test",
    phone: "555-0155",
    contacts: [
      { name: "Corin Mayfield", email: "corin@bluehour.test", note: "A&R" },
      { name: "Dana Pell", email: "accounts@bluehour.test", note: "Accounts payable" },
    ],
  },
];

async function insertUser(tx: Tx, email: string, name: string, passwordHash: string): Promise<string> {
  const userId = generateId();
  await tx.insert(user).values({ id: userId, email, name, emailVerified: true });
  await tx.insert(account).values({
    id: generateId(),
    userId,
    accountId: userId,
    providerId: "credential",
    password: passwordHash,
  });
  return userId;
}

export async function isSeeded(db: Db): Promise<boolean> {
  const rows = await db.select({ id: studio.id }).from(studio).limit(1);
  return rows.length > 0;
}

export async function seedDemo(db: Db, options: { uploadsDir?: string } = {}): Promise<void> {
  const passwordHash = await hashPassword(demoPassword);
  await db.transaction(async (tx) => {
    await tx.insert(studio).values(demoStudio);
    for (const member of demoStaff) {
      const userId = await insertUser(tx, member.email, member.name, passwordHash);
      await tx.insert(staffProfiles).values({ userId, role: member.role, displayName: member.name });
    }
    for (const client of demoClients) {
      const [created] = await tx
        .insert(clientAccounts)
        .values({ name: client.name, kind: client.kind, email: client.email, phone: client.phone })
        .$returningId();
      const clientAccountId = created!.id;
      await tx.insert(clientContacts).values(
        client.contacts.map((contact, position) => ({
          clientAccountId,
          name: contact.name,
          email: contact.email ?? null,
          phone: contact.phone ?? null,
          note: contact.note ?? null,
          isPrimary: position === 0,
          position,
        })),
      );
      if (client.user) {
        const userId = await insertUser(tx, client.user.email, client.user.name, passwordHash);
        await tx.insert(clientUsers).values({ userId, clientAccountId });
      }
    }
    await seedStudioFloor(tx);
    await seedTime(tx);
    await seedTape(tx, new Date(), options.uploadsDir);
    await seedInvoices(tx);
    await seedVault(tx);
  });
}
