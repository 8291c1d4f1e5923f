import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import {
  equipmentKindLabels,
  equipmentKinds,
  tapeWidthLabel,
  tapeWidthsMils,
  type CreateEquipmentInput,
  type EquipmentDto,
  type RoomDto,
} from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { parseNumberList } from "../../../lib/units.ts";
import { useCreateEquipment } from "../api/create-equipment.ts";
import { useUpdateEquipment } from "../api/update-equipment.ts";

const equipmentForm = z.object({
  name: z.string().trim().min(1, "Enter a name").max(120, "Use at most 120 characters"),
  kind: z.enum(equipmentKinds, "Choose a kind of equipment"),
  homeRoomId: z.string(),
  trackCount: z.string().regex(/^(\d{1,2})?$/, "Enter a number of tracks, or leave it empty"),
  tapeWidthMils: z.string(),
  speeds: z.string().refine((text) => parseNumberList(text) !== null, "List speeds as numbers, e.g. 15, 30"),
  notes: z.string().trim().max(1000, "Use at most 1000 characters"),
  active: z.boolean(),
});
type EquipmentFormValues = z.infer<typeof equipmentForm>;

const fields = ["name", "kind", "homeRoomId", "trackCount", "tapeWidthMils", "speeds", "notes", "active"] as const;

const toFormValues = (item?: EquipmentDto): EquipmentFormValues => ({
  name: item?.name ?? "",
  kind: item?.kind ?? "tape_recorder",
  homeRoomId: item?.homeRoomId ? String(item.homeRoomId) : "",
  trackCount: item?.trackCount ? String(item.trackCount) : "",
  tapeWidthMils: item?.tapeWidthMils ? String(item.tapeWidthMils) : "",
  speeds: item?.speedsIps.join(", ") ?? "",
  notes: item?.notes ?? "",
  active: item?.active ?? true,
});

const toInput = (values: EquipmentFormValues): CreateEquipmentInput => ({
  name: values.name,
  kind: values.kind,
  homeRoomId: values.homeRoomId ? Number(values.homeRoomId) : null,
  trackCount: values.trackCount ? Number(values.trackCount) : null,
  tapeWidthMils: values.tapeWidthMils ? Number(values.tapeWidthMils) : null,
  speedsIps: parseNumberList(values.speeds) ?? [],
  notes: values.notes,
});

const fromApiField = (field: string): string => (field.startsWith("speedsIps") ? "speeds" : field);

type EquipmentFormDialogProps = { open: boolean; onClose: () => void; rooms: RoomDto[]; item?: EquipmentDto };

export function EquipmentFormDialog({ open, onClose, rooms, item }: EquipmentFormDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title={item ? `Edit ${item.name}` : "Add equipment"} size="lg">
      {item ? <EditEquipment item={item} rooms={rooms} onDone={onClose} /> : <AddEquipment rooms={rooms} onDone={onClose} />}
    </Dialog>
  );
}

function AddEquipment({ rooms, onDone }: { rooms: RoomDto[]; onDone: () => void }) {
  const toast = useToast();
  const create = useCreateEquipment();
  return (
    <EquipmentForm
      rooms={rooms}
      defaultValues={toFormValues()}
      submitLabel="Save equipment"
      showActive={false}
      onCancel={onDone}
      onSubmit={async (values) => {
        const saved = await create.mutateAsync(toInput(values));
        toast(`${saved.name} added`);
        onDone();
      }}
    />
  );
}

function EditEquipment({ item, rooms, onDone }: { item: EquipmentDto; rooms: RoomDto[]; onDone: () => void }) {
  const toast = useToast();
  const update = useUpdateEquipment(item.id);
  return (
    <EquipmentForm
      rooms={rooms}
      defaultValues={toFormValues(item)}
      submitLabel="Save changes"
      showActive
      onCancel={onDone}
      onSubmit={async (values) => {
        const saved = await update.mutateAsync({ ...toInput(values), active: values.active });
        toast(saved.homeRoomName && saved.homeRoomId !== item.homeRoomId ? `${saved.name} now lives in ${saved.homeRoomName}` : `${saved.name} saved`);
        onDone();
      }}
    />
  );
}

type EquipmentFormProps = {
  rooms: RoomDto[];
  defaultValues: EquipmentFormValues;
  submitLabel: string;
  showActive: boolean;
  onSubmit: (values: EquipmentFormValues) => Promise<unknown>;
  onCancel: () => void;
};

function EquipmentForm({ rooms, defaultValues, submitLabel, showActive, onSubmit, onCancel }: EquipmentFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<EquipmentFormValues>({ resolver: zodResolver(equipmentForm), defaultValues });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (error) {
      setFormError(applyApiErrors(error, setError, { fields, fromApiField }));
    }
  });

  const { errors } = formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="Name" error={errors.name?.message}>
          {(field) => <Input {...field} {...register("name")} autoComplete="off" />}
        </FormField>
        <FormField label="Kind" error={errors.kind?.message}>
          {(field) => (
            <Select {...field} {...register("kind")}>
              {equipmentKinds.map((kind) => (
                <option key={kind} value={kind}>
                  {equipmentKindLabels[kind]}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Home room" hint="Moving kit to another room changes its home room." error={errors.homeRoomId?.message}>
          {(field) => (
            <Select {...field} {...register("homeRoomId")}>
              <option value="">No home room (stores)</option>
              {rooms.map((room) => (
                <option key={room.id} value={room.id}>
                  {room.name}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Track count" optional error={errors.trackCount?.message}>
          {(field) => <Input {...field} {...register("trackCount")} inputMode="numeric" autoComplete="off" />}
        </FormField>
        <FormField label="Tape width" optional error={errors.tapeWidthMils?.message}>
          {(field) => (
            <Select {...field} {...register("tapeWidthMils")}>
              <option value="">Not a tape machine</option>
              {tapeWidthsMils.map((mils) => (
                <option key={mils} value={mils}>
                  {tapeWidthLabel(mils)}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Speeds (in/s)" optional hint="Comma-separated, e.g. 15, 30" error={errors.speeds?.message}>
          {(field) => <Input {...field} {...register("speeds")} inputMode="decimal" autoComplete="off" />}
        </FormField>
      </div>
      <FormField label="Notes" optional error={errors.notes?.message}>
        {(field) => <Textarea {...field} {...register("notes")} rows={2} />}
      </FormField>
      {showActive ? (
        <label className="flex items-center gap-2 text-sm font-medium">
          <input type="checkbox" {...register("active")} className="size-4 accent-rust" />
          In service (offered on bookings)
        </label>
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
