import { z } from "zod";
import { isValidTimeZone } from "../shared/time-zone.ts";
import { supportedCurrencies } from "../shared/currency.ts";
import { optionalEmail, optionalText } from "./common.ts";
import { defineRoute } from "./route.ts";

export const studioDto = z.object({
  name: z.string(),
  timeZone: z.string(),
  currency: z.string(),
  workweekStartDay: z.number().int().min(1).max(7),
  address: z.string().nullable(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  holdHours: z.number().int(),
  depositBp: z.number().int(),
  cancellationTiers: z.array(z.object({ noticeUnderHours: z.number(), feeBp: z.number() })),
});
export type StudioDto = z.infer<typeof studioDto>;

export const updateStudioInput = z.strictObject({
  name: z.string().trim().min(1, "Enter the studio's name").max(120).optional(),
  timeZone: z
    .string()
    .max(64)
    .refine(isValidTimeZone, "Use an IANA time zone such as America/Chicago")
    .optional(),
  currency: z.enum(supportedCurrencies as [string, ...string[]]).optional(),
  address: optionalText(500),
  email: optionalEmail,
  phone: optionalText(40),
  holdHours: z.number().int().min(1, "A hold lasts at least an hour").max(24 * 60, "Keep holds under 60 days").optional(),
  depositBp: z.number().int().min(0).max(10000, "A deposit is at most 100%").optional(),
  cancellationTiers: z
    .array(
      z.strictObject({
        noticeUnderHours: z.number().int().min(1).max(24 * 365),
        feeBp: z.number().int().min(0).max(10000, "A fee is at most 100%"),
      }),
    )
    .max(6, "Keep to six tiers")
    .optional(),
});
export type UpdateStudioInput = z.infer<typeof updateStudioInput>;

/** The studio's own settings. */
export const studioRoutes = {
  get: defineRoute({ method: "get", path: "/api/studio", summary: "The studio's name, time zone, currency and workweek", access: "signed-in", response: studioDto }),
  update: defineRoute({ method: "patch", path: "/api/studio", summary: "Change the studio's settings", access: ["owner"], body: updateStudioInput, response: studioDto }),
};
