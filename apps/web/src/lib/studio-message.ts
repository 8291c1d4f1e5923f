import { formatStudioDayTime } from "./studio-time.ts";

const isoInstant = /\b\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:Z|[+-]\d{2}:?\d{2})/g;

/**
 * Some API messages carry raw instants ("clocked in since 2026-12-07T15:58:00.000Z"); people
 * read them on the studio's clock instead ("since Mon 7 Dec, 09:58").
 */
export const inStudioTime = (message: string, timeZone: string) => message.replace(isoInstant, (iso) => formatStudioDayTime(iso, timeZone));
