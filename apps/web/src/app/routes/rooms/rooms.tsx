import { useCallback, useState } from "react";
import type { EquipmentDto, RoomDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canEditRooms, canManageRoomFeeds, canSeeEquipment, canSeeRates } from "../../../config/access.ts";
import { RoomFeedAction } from "../../../features/calendar-feeds/components/room-feed-action.tsx";
import { useEngineerRates } from "../../../features/rooms/api/get-engineer-rates.ts";
import { useEngineers } from "../../../features/rooms/api/get-engineers.ts";
import { useEquipment } from "../../../features/rooms/api/get-equipment.ts";
import { useRooms } from "../../../features/rooms/api/get-rooms.ts";
import { EngineerRates } from "../../../features/rooms/components/engineer-rates.tsx";
import { EquipmentFormDialog } from "../../../features/rooms/components/equipment-form-dialog.tsx";
import { EquipmentTable } from "../../../features/rooms/components/equipment-table.tsx";
import { RateCardFormDialog } from "../../../features/rooms/components/rate-card-form-dialog.tsx";
import { RoomFormDialog } from "../../../features/rooms/components/room-form-dialog.tsx";
import { RoomsTable } from "../../../features/rooms/components/rooms-table.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";
import { RecorderCare } from "../../../features/vault/components/recorder-care.tsx";
import { studioToday } from "../../../lib/studio-time.ts";

type Editing =
  | { kind: "room"; room?: RoomDto }
  | { kind: "rate-card"; room: RoomDto }
  | { kind: "equipment"; item?: EquipmentDto }
  | null;

export function RoomsRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const rooms = useRooms();
  const owner = canEditRooms(me.role);
  const seesRates = canSeeRates(me.role);
  const seesEquipment = canSeeEquipment(me.role);
  const equipment = useEquipment({ enabled: seesEquipment });
  const rates = useEngineerRates({ enabled: seesRates });
  const engineers = useEngineers({ enabled: owner });
  const [editing, setEditing] = useState<Editing>(null);
  const close = () => setEditing(null);

  const timeZone = studio.data?.timeZone ?? "UTC";
  const currency = studio.data?.currency ?? "USD";
  const onEdit = useCallback((room: RoomDto) => setEditing({ kind: "room", room }), []);
  const onNewRateCard = useCallback((room: RoomDto) => setEditing({ kind: "rate-card", room }), []);
  const onEditEquipment = useCallback((item: EquipmentDto) => setEditing({ kind: "equipment", item }), []);
  const renderFeed = useCallback((room: RoomDto) => <RoomFeedAction room={room} timeZone={timeZone} />, [timeZone]);

  const header = (
    <PageHeader
      title="Rooms and rates"
      description={owner ? "The rooms, what they cost, the kit in them and what engineer time is billed at." : "The rooms, what they cost and the kit in them."}
      actions={owner ? <Button onClick={() => setEditing({ kind: "room" })}>Add room</Button> : null}
    />
  );
  const failed = studio.isError ? studio : rooms.isError ? rooms : null;
  if (failed) {
    return (
      <>
        {header}
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      </>
    );
  }
  if (studio.isPending || rooms.isPending) {
    return (
      <>
        {header}
        <LoadingState />
      </>
    );
  }

  const allRooms = rooms.data ?? [];
  return (
    <>
      {header}
      <section aria-labelledby="rooms-heading" className="flex flex-col gap-3">
        <h2 id="rooms-heading" className="sr-only">
          Rooms
        </h2>
        <RoomsTable
          rooms={allRooms}
          currency={currency}
          timeZone={timeZone}
          canEdit={owner}
          canSeeRates={seesRates}
          onEdit={onEdit}
          onNewRateCard={onNewRateCard}
          renderActions={canManageRoomFeeds(me.role) ? renderFeed : undefined}
        />
      </section>

      {seesEquipment ? (
        <section aria-labelledby="equipment-heading" className="mt-10 flex flex-col gap-3">
          <div className="flex flex-wrap items-end justify-between gap-2">
            <div>
              <h2 id="equipment-heading" className="text-lg font-semibold">
                Equipment
              </h2>
              <p className="text-sm text-muted">Kit that can be booked with a session. Each piece lives in one room, or in the stores.</p>
            </div>
            {owner ? (
              <Button variant="secondary" onClick={() => setEditing({ kind: "equipment" })}>
                Add equipment
              </Button>
            ) : null}
          </div>
          {equipment.isPending ? (
            <LoadingState />
          ) : equipment.isError ? (
            <ErrorState error={equipment.error} onRetry={() => void equipment.refetch()} />
          ) : (
            <EquipmentTable equipment={equipment.data} canEdit={owner} onEdit={onEditEquipment} />
          )}
        </section>
      ) : null}

      {me.role === "owner" || me.role === "manager" ? (
        <section id="recorder-care" aria-labelledby="recorder-care-heading" className="mt-10 flex flex-col gap-3">
          <h2 id="recorder-care-heading" className="text-lg font-semibold">
            Recorder care
          </h2>
          <RecorderCare today={studioToday(timeZone)} />
        </section>
      ) : null}

      {seesRates ? (
        <section aria-labelledby="engineer-rates-heading" className="mt-10 flex flex-col gap-3">
          <h2 id="engineer-rates-heading" className="text-lg font-semibold">
            Engineer rates
          </h2>
          {rates.isPending ? (
            <LoadingState />
          ) : rates.isError ? (
            <ErrorState error={rates.error} onRetry={() => void rates.refetch()} />
          ) : (
            <EngineerRates rates={rates.data} engineers={engineers.data ?? []} currency={currency} timeZone={timeZone} canEdit={owner} />
          )}
        </section>
      ) : null}

      {owner ? (
        <>
          <RoomFormDialog open={editing?.kind === "room"} onClose={close} room={editing?.kind === "room" ? editing.room : undefined} />
          {editing?.kind === "rate-card" ? (
            <RateCardFormDialog open onClose={close} room={editing.room} timeZone={timeZone} currency={currency} />
          ) : null}
          <EquipmentFormDialog
            open={editing?.kind === "equipment"}
            onClose={close}
            rooms={allRooms}
            item={editing?.kind === "equipment" ? editing.item : undefined}
          />
        </>
      ) : null}
    </>
  );
}
