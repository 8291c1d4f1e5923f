import { z } from "zod";

export const caughtMessageDto = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: z.string(),
  text: z.string(),
  html: z.string().nullable(),
});
export type CaughtMessageDto = z.infer<typeof caughtMessageDto>;
