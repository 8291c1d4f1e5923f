import type { ClientDetailDto, MeDto, StaffMemberDto, StudioDto } from "@takeup/domain";

// Wrenfield Sound, the invented studio every example in Takeup uses.
export const studio: StudioDto = {
  name: "Wrenfield Sound",
  timeZone: "America/Chicago",
  currency: "USD",
  workweekStartDay: 1,
  address: "14 Mill Race Lane, Wrenfield",
  email: "hello@wrenfield.test",
  phone: "555-0142",
};

export const owner: MeDto = { id: "u-mara", name: "Mara Linden", email: "owner@wrenfield.test", role: "owner", clientAccount: null };
export const manager: MeDto = { id: "u-theo", name: "Theo Vance", email: "manager@wrenfield.test", role: "manager", clientAccount: null };
export const engineer: MeDto = { id: "u-priya", name: "Priya Oduya", email: "priya@wrenfield.test", role: "engineer", clientAccount: null };
export const clientUser: MeDto = {
  id: "u-rosa",
  name: "Rosa Delacourt",
  email: "band@lanternstatic.test",
  role: "client",
  clientAccount: { id: 1, name: "Lantern Static" },
};

export const member = (over: Partial<StaffMemberDto> = {}): StaffMemberDto => ({
  userId: "u-sam",
  name: "Sam Reyes",
  email: "sam@wrenfield.test",
  role: "engineer",
  active: true,
  joinedAt: "2026-01-12T15:00:00.000Z",
  ...over,
});

export const lanternStatic: ClientDetailDto = {
  id: 1,
  name: "Lantern Static",
  kind: "band",
  email: "band@lanternstatic.test",
  phone: "555-0181",
  active: true,
  primaryContact: "Rosa Delacourt",
  userCount: 1,
  billingAddress: null,
  notes: null,
  contacts: [{ id: 10, name: "Rosa Delacourt", email: "rosa@lanternstatic.test", phone: "555-0182", note: null, isPrimary: true }],
  users: [{ userId: "u-rosa", name: "Rosa Delacourt", email: "band@lanternstatic.test", active: true }],
  invitations: [],
};
