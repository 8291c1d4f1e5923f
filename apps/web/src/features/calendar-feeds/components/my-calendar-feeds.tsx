import { Button } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { useCreateCalendarFeed } from "../api/create-calendar-feed.ts";
import { useCalendarFeeds } from "../api/get-calendar-feeds.ts";
import { FeedAddress } from "./feed-address.tsx";
import { FeedList } from "./feed-list.tsx";

/** An engineer's own schedule as a calendar subscription. */
export function MyCalendarFeeds({ staffUserId, timeZone }: { staffUserId: string; timeZone: string }) {
  const feeds = useCalendarFeeds();
  const create = useCreateCalendarFeed();
  const url = create.data?.url ?? null;

  return (
    <Card title="Calendar subscription">
      <div className="flex flex-col gap-3">
        <p className="text-sm text-muted">Your sessions in the calendar app on your phone or computer, kept up to date by the studio.</p>
        <div>
          <Button size="sm" onClick={() => create.mutate({ staffUserId })} pending={create.isPending}>
            Subscribe to my calendar
          </Button>
        </div>
        <FormAlert message={create.isError ? errorMessage(create.error) : null} />
        {url ? <FeedAddress url={url} /> : null}
        {feeds.isPending ? (
          <LoadingState />
        ) : feeds.isError ? (
          <ErrorState error={feeds.error} onRetry={() => void feeds.refetch()} />
        ) : (
          <FeedList feeds={feeds.data.filter((f) => f.staffUserId === staffUserId)} timeZone={timeZone} empty="No subscriptions yet." />
        )}
      </div>
    </Card>
  );
}
