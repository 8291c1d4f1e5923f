import type { MeDto } from "@takeup/domain";
import { formatStudioDay, greetingFor } from "../../../lib/dates.ts";

/** "Good morning, Mara · Tuesday, March 3, 2026", as the clock reads at the studio. */
export function StudioDay({ me, timeZone }: { me: MeDto; timeZone: string }) {
  const now = new Date();
  const firstName = me.name.split(" ")[0] ?? me.name;
  return (
    <>
      {greetingFor(now, timeZone)}, {firstName}. <span className="whitespace-nowrap">It&apos;s {formatStudioDay(now, timeZone)}.</span>
    </>
  );
}
