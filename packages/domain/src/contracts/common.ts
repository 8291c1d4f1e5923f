import { z } from "zod";
import { apiErrorCodes } from "./errors.ts";

/** The one shape of every error the API returns. */
export const apiErrorDto = z.object({
  error: z.object({
    // Parsed as any string (an older web app must still show a newer server's message), documented as the list.
    code: z.string().meta({ description: "What went wrong, one of the API's error codes", enum: [...apiErrorCodes] }),
    message: z.string(),
    details: z
      .array(z.object({ field: z.string(), rule: z.string(), message: z.string() }))
      .optional(),
  }),
});
export type ApiErrorDto = z.infer<typeof apiErrorDto>;

export const idParams = z.strictObject({ id: z.coerce.number().int().positive().max(2 ** 53 - 1) });
export const userIdParams = z.strictObject({ userId: z.string().min(1).max(36) });

export const personName = z.string().trim().min(1, "Enter a name").max(120, "Use at most 120 characters");
export const emailAddress = z.email("Enter a valid e-mail address").max(254, "Use at most 254 characters");
/** An optional e-mail from a form: an empty string means "none". */
export const optionalEmail = z.union([emailAddress, z.literal("")]).optional();
export const optionalText = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`).optional();
export const password = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(128, "Use at most 128 characters");

export const okDto = z.object({ ok: z.literal(true) });
