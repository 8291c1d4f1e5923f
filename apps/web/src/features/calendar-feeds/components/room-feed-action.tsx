import { useState } from "react";
import type { RoomDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { useCreateCalendarFeed } from "../api/create-calendar-feed.ts";
import { useCalendarFeeds } from "../api/get-calendar-feeds.ts";
import { FeedAddress } from "./feed-address.tsx";
import { FeedList } from "./feed-list.tsx";

/** A room's calendar feed: anyone with the address sees the room's bookings in their calendar app. */
export function RoomFeedAction({ room, timeZone }: { room: Pick<RoomDto, "id" | "name">; timeZone: string }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="ghost" size="sm" aria-label={`Calendar feed for ${room.name}`} onClick={() => setOpen(true)}>
        Feed
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title={`Calendar feed for ${room.name}`}
        description="A read-only calendar of the room's bookings, for a calendar app or a screen by the door."
      >
        <RoomFeeds roomId={room.id} timeZone={timeZone} onDone={() => setOpen(false)} />
      </Dialog>
    </>
  );
}

function RoomFeeds({ roomId, timeZone, onDone }: { roomId: number; timeZone: string; onDone: () => void }) {
  const feeds = useCalendarFeeds();
  const create = useCreateCalendarFeed();
  const url = create.data?.url ?? null;

  return (
    <div className="flex flex-col gap-4">
      <FormAlert message={create.isError ? errorMessage(create.error) : null} />
      {url ? <FeedAddress url={url} /> : null}
      {feeds.isPending ? (
        <LoadingState />
      ) : feeds.isError ? (
        <ErrorState error={feeds.error} onRetry={() => void feeds.refetch()} />
      ) : (
        <FeedList feeds={feeds.data.filter((f) => f.roomId === roomId)} timeZone={timeZone} empty="No feed for this room yet." />
      )}
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Close
        </Button>
        <Button onClick={() => create.mutate({ roomId })} pending={create.isPending}>
          {url ? "Create another feed" : "Create a feed"}
        </Button>
      </DialogActions>
    </div>
  );
}
