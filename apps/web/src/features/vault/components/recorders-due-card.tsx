import { Link } from "react-router";
import { careKindLabels } from "@takeup/domain";
import { Card } from "../../../components/ui/card.tsx";
import { useRecorders } from "../api/recorders.ts";

/** The owner's home: recorders due for care, and sessions that would run one past its alignment interval. */
export function RecordersDueCard({ careHref }: { careHref: string }) {
  const recorders = useRecorders();
  if (!recorders.data) return null;
  const due = recorders.data.flatMap((r) => r.care.filter((c) => c.due).map((c) => ({ recorder: r, care: c })));
  const warned = recorders.data.filter((r) => r.alignmentWarnings.length > 0 && !r.care.some((c) => c.kind === "alignment" && c.due));
  return (
    <Card title="Recorders due" actions={<Link to={careHref} className="text-sm font-medium text-rust-deep underline-offset-2 hover:underline">Recorder care</Link>}>
      {due.length === 0 && warned.length === 0 ? (
        <p className="text-sm text-muted">No recorder is due for care.</p>
      ) : (
        <ul className="flex flex-col gap-1 text-sm">
          {due.map(({ recorder, care }) => (
            <li key={`${recorder.id}-${care.kind}`}>
              <span className="font-semibold">{recorder.name}</span>: {careKindLabels[care.kind].toLowerCase()} due — {care.hoursSince} h since, interval {care.intervalHours} h
            </li>
          ))}
          {warned.map((r) => (
            <li key={`${r.id}-ahead`}>
              <span className="font-semibold">{r.name}</span>: booked sessions would pass its alignment interval
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
