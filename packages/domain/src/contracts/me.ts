import { z } from "zod";
import { roles } from "../auth/roles.ts";

export const meDto = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.enum(roles),
  clientAccount: z.object({ id: z.number(), name: z.string() }).nullable(),
});
export type MeDto = z.infer<typeof meDto>;
