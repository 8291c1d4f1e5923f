import { useState } from "react";
import type { CalendarFeedDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ConfirmDialog } from "../../../components/ui/confirm-dialog.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useRevokeCalendarFeed } from "../api/revoke-calendar-feed.ts";
import { formatStudioStamp } from "../../../lib/studio-time.ts";

/** Feeds still working, each with a way to revoke it. */
export function FeedList({ feeds, timeZone, empty }: { feeds: CalendarFeedDto[]; timeZone: string; empty: string }) {
  const toast = useToast();
  const revoke = useRevokeCalendarFeed();
  const [revoking, setRevoking] = useState<CalendarFeedDto | null>(null);
  const live = feeds.filter((feed) => feed.revokedAt === null);

  if (live.length === 0) return <p className="text-sm text-muted">{empty}</p>;
  return (
    <>
      <ul className="divide-y divide-line rounded-md border border-line bg-card">
        {live.map((feed) => (
          <li key={feed.id} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2 text-sm">
            <div className="min-w-0">
              <p className="font-medium">{feed.name}</p>
              <p className="text-muted">Created {formatStudioStamp(feed.createdAt, timeZone)}</p>
            </div>
            <Button variant="ghost" size="sm" aria-label={`Revoke ${feed.name}`} onClick={() => setRevoking(feed)}>
              Revoke
            </Button>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        open={revoking !== null}
        title="Revoke this feed?"
        confirmLabel="Revoke feed"
        tone="danger"
        pending={revoke.isPending}
        onCancel={() => setRevoking(null)}
        onConfirm={() => {
          if (!revoking) return;
          revoke.mutate(revoking.id, {
            onSuccess: () => {
              toast("Feed revoked");
              setRevoking(null);
            },
            onError: (error) => {
              toast(errorMessage(error), "error");
              setRevoking(null);
            },
          });
        }}
      >
        <p>Calendars subscribed to {revoking?.name ?? "this feed"} stop updating. You can create a new feed at any time.</p>
      </ConfirmDialog>
    </>
  );
}
