import type {
  BookingDto,
  ClientDetailDto,
  ClientSummaryDto,
  EngineerDto,
  EquipmentDto,
  MeDto,
  QuoteResultDto,
  RateCardVersionDto,
  RoomDto,
  StaffMemberDto,
  StudioDto,
} from "@takeup/domain";

// Wrenfield Sound, the invented studio every example in Takeup uses.
export const studio: StudioDto = {
  name: "Wrenfield Sound",
  timeZone: "America/Chicago",
  currency: "USD",
  workweekStartDay: 1,
  address: "14 Mill Race Lane, Wrenfield",
  email: "hello@wrenfield.test",
  phone: "555-0142",
  holdHours: 72,
  depositBp: 2500,
  cancellationTiers: [
    { noticeUnderHours: 48, feeBp: 5000 },
    { noticeUnderHours: 24, feeBp: 10000 },
  ],
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

export const bookkeeper: MeDto = { id: "u-ada", name: "Ada Quill", email: "books@wrenfield.test", role: "bookkeeper", clientAccount: null };

export const rateCard = (over: Partial<RateCardVersionDto> = {}): RateCardVersionDto => ({
  id: 7,
  roomId: 1,
  version: 2,
  effectiveFrom: "2026-11-01T05:00:00.000Z",
  hourlyRateCents: 6500,
  dayRateCents: 52000,
  dayCoversMinutes: 600,
  minimumBillableMinutes: 120,
  billingIncrementMinutes: 30,
  afterHoursStartMinute: 22 * 60,
  afterHoursEndMinute: 8 * 60,
  afterHoursPremiumBp: 2500,
  weekendPremiumBp: 1500,
  lockoutDayRateCents: null,
  lockoutWeekendPremium: false,
  note: null,
  createdAt: "2026-10-20T15:00:00.000Z",
  ...over,
});

export const roomA: RoomDto = {
  id: 1,
  name: "Room A",
  description: "Live room",
  capacity: 10,
  colour: "rust",
  turnoverMinutes: 30,
  position: 0,
  active: true,
  currentRateCard: rateCard(),
};
export const roomB: RoomDto = {
  ...roomA,
  id: 2,
  name: "Room B",
  description: "Overdub booth",
  capacity: 3,
  colour: "moss",
  position: 1,
  currentRateCard: rateCard({ id: 8, roomId: 2, version: 1, hourlyRateCents: 4000, dayRateCents: 32000 }),
};
export const roomC: RoomDto = {
  ...roomA,
  id: 3,
  name: "Room C",
  description: "Mix suite",
  capacity: 4,
  colour: "slate",
  position: 2,
  currentRateCard: rateCard({ id: 9, roomId: 3, version: 1, hourlyRateCents: 5500, dayRateCents: 44000 }),
};
export const rooms: RoomDto[] = [roomA, roomB, roomC];

export const engineers: EngineerDto[] = [
  { userId: "u-priya", name: "Priya Oduya", grade: "engineer" },
  { userId: "u-sam", name: "Sam Reyes", grade: "engineer" },
  { userId: "u-jo", name: "Jo Kettering", grade: "assistant" },
];

export const tapeMachine: EquipmentDto = {
  id: 31,
  name: "Two-inch 24-track tape machine",
  kind: "tape_recorder",
  homeRoomId: 1,
  homeRoomName: "Room A",
  trackCount: 24,
  tapeWidthMils: 2000,
  speedsIps: [15, 30],
  notes: null,
  active: true,
};

export const clientSummaries: ClientSummaryDto[] = [
  { id: 1, name: "Lantern Static", kind: "band", email: null, phone: null, active: true, primaryContact: "Rosa Delacourt", userCount: 1 },
  { id: 2, name: "The Quiet Orchard", kind: "band", email: null, phone: null, active: true, primaryContact: null, userCount: 0 },
  { id: 3, name: "Copper Vale", kind: "band", email: null, phone: null, active: true, primaryContact: null, userCount: 0 },
];

type Quote = BookingDto["quote"];

/** Room A, Monday 7 December 2026, 10:00–13:00 Chicago time (16:00–19:00 UTC), with Sam Reyes engineering. */
export const quote = (over: Partial<Quote> = {}): Quote => ({
  rateCardId: "7",
  rateCardLabel: "Room A rate card v2 (from 1 Nov 2026)",
  currency: "USD",
  timeZone: "America/Chicago",
  elapsedMinutes: 180,
  billableMinutes: 180,
  lines: [
    {
      kind: "room_hourly",
      label: "Room A, 3 h",
      quantity: 180,
      unit: "hour",
      unitAmountCents: 6500,
      amountCents: 19500,
      minutes: 180,
      date: "2026-12-07",
      explanation: "3 h of room time at $65.00 an hour; cheaper than the day rate of $520.00.",
    },
    {
      kind: "engineer",
      label: "Sam Reyes, engineer",
      quantity: 180,
      unit: "hour",
      unitAmountCents: 3000,
      amountCents: 9000,
      minutes: 180,
      engineerId: "u-sam",
      explanation: "3 h at the engineer rate of $30.00 an hour.",
    },
  ],
  totalCents: 28500,
  ...over,
});

export const quoteResult = (over: Partial<QuoteResultDto> = {}): QuoteResultDto => ({
  roomId: 1,
  rateCardVersionId: 7,
  quote: quote(),
  depositRequiredCents: 7125,
  conflicts: [],
  canQueueBehindHold: false,
  ...over,
});

export const booking = (over: Partial<BookingDto> = {}): BookingDto => ({
  id: 12,
  room: { id: 1, name: "Room A", colour: "rust" },
  client: { id: 3, name: "Copper Vale" },
  project: { id: 40, name: "Second album" },
  startsAt: "2026-12-07T16:00:00.000Z",
  endsAt: "2026-12-07T19:00:00.000Z",
  status: "confirmed",
  lockout: false,
  holdExpiresAt: null,
  queuedBehindId: null,
  engineers: [{ userId: "u-sam", name: "Sam Reyes", grade: "engineer" }],
  equipment: [],
  title: "Drum tracking",
  notes: null,
  rateCardVersionId: 7,
  quote: quote(),
  quoteTotalCents: 28500,
  depositRequiredCents: 7125,
  depositReceivedAt: null,
  requestedByClient: false,
  cancelledAt: null,
  cancellationReason: null,
  cancellationFeeCents: null,
  allowedActions: ["start", "cancel"],
  createdAt: "2026-11-20T15:00:00.000Z",
  ...over,
});
