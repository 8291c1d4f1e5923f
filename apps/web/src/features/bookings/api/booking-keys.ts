import type { BookingStatus, QuoteInput } from "@takeup/domain";

export type BookingsParams = {
  from: string;
  to: string;
  roomId?: number;
  engineerId?: string;
  clientAccountId?: number;
  status?: BookingStatus;
};

export const bookingKeys = {
  all: ["bookings"] as const,
  lists: () => [...bookingKeys.all, "list"] as const,
  list: (params: BookingsParams) => [...bookingKeys.lists(), params] as const,
  details: () => [...bookingKeys.all, "detail"] as const,
  detail: (id: number) => [...bookingKeys.details(), id] as const,
  cancellationPreview: (id: number) => [...bookingKeys.all, "cancellation-preview", id] as const,
};

export const quoteKeys = {
  all: ["quotes"] as const,
  quote: (input: QuoteInput) => [...quoteKeys.all, input] as const,
};

export const projectKeys = {
  all: ["projects"] as const,
  list: (clientId: number) => [...projectKeys.all, "list", clientId] as const,
};
