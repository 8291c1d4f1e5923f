import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { roomColourHex, roomColours, updateRoomInput, type RoomDto, type UpdateRoomInput } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useCreateRoom } from "../api/create-room.ts";
import { useUpdateRoom } from "../api/update-room.ts";
import { roomColourLabels } from "./room-labels.ts";

// Same rules as the contract, with messages for an empty number box.
const roomForm = updateRoomInput.extend({
  name: z.string().trim().min(1, "Enter the room's name").max(60, "Use at most 60 characters"),
  capacity: z.number("Enter how many people fit").int("Use a whole number").min(1, "At least one person").max(500),
  turnoverMinutes: z.number("Enter the minutes, 0 for none").int("Use whole minutes").min(0).max(240, "Keep turnover under four hours"),
  colour: z.enum(roomColours, "Choose one of the room colours"),
});
type RoomFormInput = z.input<typeof roomForm>;
type RoomFormValues = z.output<typeof roomForm>;

const fields = ["name", "description", "capacity", "colour", "turnoverMinutes", "position", "active"] as const;

type RoomFormDialogProps = { open: boolean; onClose: () => void; room?: RoomDto };

export function RoomFormDialog({ open, onClose, room }: RoomFormDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title={room ? `Edit ${room.name}` : "Add a room"} size="md">
      {room ? <EditRoomForm room={room} onDone={onClose} /> : <AddRoomForm onDone={onClose} />}
    </Dialog>
  );
}

function AddRoomForm({ onDone }: { onDone: () => void }) {
  const toast = useToast();
  const create = useCreateRoom();
  return (
    <RoomForm
      defaultValues={{ name: "", description: "", capacity: 4, colour: "slate", turnoverMinutes: 30 }}
      submitLabel="Save room"
      onCancel={onDone}
      onSubmit={async ({ active: _active, position: _position, ...values }) => {
        const saved = await create.mutateAsync({ ...values, description: values.description ?? "" });
        toast(`${saved.name} added`);
        onDone();
      }}
      showPlacement={false}
    />
  );
}

function EditRoomForm({ room, onDone }: { room: RoomDto; onDone: () => void }) {
  const toast = useToast();
  const update = useUpdateRoom(room.id);
  return (
    <RoomForm
      defaultValues={{
        name: room.name,
        description: room.description ?? "",
        capacity: room.capacity,
        colour: room.colour,
        turnoverMinutes: room.turnoverMinutes,
        position: room.position,
        active: room.active,
      }}
      submitLabel="Save changes"
      onCancel={onDone}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync(values);
        toast(`${saved.name} saved`);
        onDone();
      }}
      showPlacement
    />
  );
}

type RoomFormProps = {
  defaultValues: RoomFormInput;
  submitLabel: string;
  onSubmit: (values: UpdateRoomInput & RoomFormValues) => Promise<unknown>;
  onCancel: () => void;
  showPlacement: boolean;
};

function RoomForm({ defaultValues, submitLabel, onSubmit, onCancel, showPlacement }: RoomFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<RoomFormInput, unknown, RoomFormValues>({
    resolver: zodResolver(roomForm),
    defaultValues,
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (error) {
      setFormError(applyApiErrors(error, setError, { fields, codeFields: { room_exists: "name" } }));
    }
  });

  const { errors } = formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="Name" error={errors.name?.message}>
        {(field) => <Input {...field} {...register("name")} autoComplete="off" />}
      </FormField>
      <FormField label="Description" optional error={errors.description?.message}>
        {(field) => <Textarea {...field} {...register("description")} rows={2} />}
      </FormField>
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="Capacity (people)" error={errors.capacity?.message}>
          {(field) => <Input {...field} {...register("capacity", { valueAsNumber: true })} type="number" min={1} step={1} inputMode="numeric" />}
        </FormField>
        <FormField label="Turnover (minutes)" hint="Kept free after each session for the next setup." error={errors.turnoverMinutes?.message}>
          {(field) => (
            <Input {...field} {...register("turnoverMinutes", { valueAsNumber: true })} type="number" min={0} step={5} inputMode="numeric" />
          )}
        </FormField>
      </div>
      <fieldset>
        <legend className="text-sm font-semibold">Calendar colour</legend>
        <div className="mt-2 flex flex-wrap gap-2">
          {roomColours.map((colour) => (
            <label
              key={colour}
              className="flex cursor-pointer items-center gap-2 rounded-md border border-line-strong bg-card px-2.5 py-1.5 text-sm has-checked:border-ink has-checked:bg-paper-deep"
            >
              <input type="radio" value={colour} {...register("colour")} className="size-4 accent-rust" />
              <span aria-hidden="true" className="size-3.5 rounded-sm" style={{ backgroundColor: roomColourHex[colour] }} />
              {roomColourLabels[colour]}
            </label>
          ))}
        </div>
        {errors.colour?.message ? <p className="mt-1 text-sm font-medium text-alert">{errors.colour.message}</p> : null}
      </fieldset>
      {showPlacement ? (
        <div className="grid items-end gap-4 sm:grid-cols-2">
          <FormField label="Position" hint="Rooms are shown on the calendar in this order." error={errors.position?.message}>
            {(field) => <Input {...field} {...register("position", { valueAsNumber: true })} type="number" min={0} step={1} inputMode="numeric" />}
          </FormField>
          <label className="flex items-center gap-2 pb-2 text-sm font-medium">
            <input type="checkbox" {...register("active")} className="size-4 accent-rust" />
            In use (shown on the calendar)
          </label>
        </div>
      ) : null}
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={formState.isSubmitting}>
          {submitLabel}
        </Button>
      </DialogActions>
    </form>
  );
}
