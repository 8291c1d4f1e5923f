import { z } from "zod";
import { defineRoute } from "./route.ts";

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

export const devMailRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/dev/mail",
    summary: "E-mail caught by the local SMTP catcher (development and tests only)",
    access: ["owner"],
    response: z.array(caughtMessageDto),
  }),
};
