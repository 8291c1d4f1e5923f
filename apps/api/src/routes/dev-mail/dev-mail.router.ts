import { z } from "zod";
import { caughtMessageDto, devMailRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { HttpError } from "../../lib/http-error.ts";
import type { Deps } from "../../deps.ts";

/** Development only: the messages the local SMTP catcher has received. */
export function devMailRouter({ config }: Deps) {
  return new ApiRouter("/api/dev/mail", "Development").handle(devMailRoutes.list, async () => {
    if (!config.mailCatcherUrl) {
      throw new HttpError(404, "mail_catcher_off", "No local mail catcher: e-mail goes to the real SMTP server");
    }
    const response = await fetch(`${config.mailCatcherUrl}/messages`);
    if (!response.ok) throw new HttpError(502, "mail_catcher_down", "The local mail catcher did not answer");
    return z.array(caughtMessageDto).parse(await response.json());
  });
}
