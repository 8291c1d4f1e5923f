import { z } from "zod";
import { roles } from "../auth/roles.ts";
import { defineRoute } from "./route.ts";

export const meDto = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.enum(roles),
  clientAccount: z.object({ id: z.number(), name: z.string() }).nullable(),
});
export type MeDto = z.infer<typeof meDto>;

/** Characters a display name may not hold: controls (including line breaks), bidirectional overrides, markup. */
const notPlainText = /[\p{Cc}\u200E\u200F\u202A-\u202E\u2066-\u2069<>]/u;

/** The name people give themselves: plain text, trimmed, 1–100 characters, well-formed Unicode. */
export const profileName = z
  .string()
  .trim()
  .min(1, "Enter a name")
  .max(100, "Use at most 100 characters")
  // Under the u flag a lone surrogate half is its own code point, of category Cs; a pair is not.
  .refine((v) => !/\p{Cs}/u.test(v), "Use only complete characters (no lone surrogate halves)")
  .refine((v) => !notPlainText.test(v), "Use plain text: no line breaks, control or direction characters, < or >");

export const updateMeInput = z.strictObject({ name: profileName });
export type UpdateMeInput = z.infer<typeof updateMeInput>;

/** The signed-in person's own record. */
export const meRoutes = {
  get: defineRoute({ method: "get", path: "/api/me", summary: "The signed-in user and their role", access: "signed-in", response: meDto }),
  update: defineRoute({
    method: "patch",
    path: "/api/me",
    summary: "Change one's own name (plain text, 1–100 characters; audited)",
    access: "signed-in",
    body: updateMeInput,
    response: meDto,
  }),
};
