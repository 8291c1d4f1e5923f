import { formatMoney, type RoomDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { formatStudioStamp, minuteToTime } from "../../../lib/studio-time.ts";
import { formatHours, formatPercent } from "../../../lib/units.ts";
import { useRateCards } from "../api/get-rate-cards.ts";

type RateCardHistoryProps = { room: RoomDto; currency: string; timeZone: string };

/** Every version of a room's prices, newest first; the one in force today is marked. */
export function RateCardHistory({ room, currency, timeZone }: RateCardHistoryProps) {
  const versions = useRateCards(room.id);
  if (versions.isPending) return <LoadingState label="Loading rate cards…" />;
  if (versions.isError) return <ErrorState error={versions.error} onRetry={() => void versions.refetch()} />;
  if (versions.data.length === 0) return <p className="text-sm text-muted">{room.name} has no rate card yet, so it cannot be quoted.</p>;

  return (
    <div className="relative overflow-x-auto">
      <table aria-label={`Rate card history for ${room.name}`} className="w-full border-collapse text-left text-xs tabular-nums">
        <thead className="text-muted">
          <tr className="border-b border-line">
            {["Version", "Effective from", "Hourly", "Day rate", "Day covers", "Minimum", "Increment", "After hours", "After-hours premium", "Weekend premium", "Note"].map(
              (heading) => (
                <th key={heading} scope="col" className="px-2 py-1.5 font-semibold whitespace-nowrap">
                  {heading}
                </th>
              ),
            )}
          </tr>
        </thead>
        <tbody>
          {versions.data.map((version) => {
            const window =
              version.afterHoursStartMinute === version.afterHoursEndMinute
                ? "None"
                : `${minuteToTime(version.afterHoursStartMinute)}–${minuteToTime(version.afterHoursEndMinute)}`;
            return (
              <tr key={version.id} className="border-b border-line last:border-b-0">
                <td className="px-2 py-1.5 whitespace-nowrap">
                  <span className="flex items-center gap-1.5">
                    v{version.version}
                    {room.currentRateCard?.id === version.id ? <Badge tone="accent">In force</Badge> : null}
                  </span>
                </td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatStudioStamp(version.effectiveFrom, timeZone)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatMoney(version.hourlyRateCents, currency)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatMoney(version.dayRateCents, currency)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatHours(version.dayCoversMinutes)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatHours(version.minimumBillableMinutes)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{version.billingIncrementMinutes} min</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{window}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatPercent(version.afterHoursPremiumBp)}</td>
                <td className="px-2 py-1.5 whitespace-nowrap">{formatPercent(version.weekendPremiumBp)}</td>
                <td className="px-2 py-1.5">{version.note ?? <span className="text-muted">—</span>}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
