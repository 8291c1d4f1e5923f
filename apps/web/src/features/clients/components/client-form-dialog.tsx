import type { ClientDetailDto } from "@takeup/domain";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { useCreateClient } from "../api/create-client.ts";
import { useUpdateClient } from "../api/update-client.ts";
import { clientToFormValues, emptyClient } from "./client-form-values.ts";
import { ClientForm } from "./client-form.tsx";

type AddClientDialogProps = { open: boolean; onClose: () => void; onCreated: (client: ClientDetailDto) => void };

export function AddClientDialog({ open, onClose, onCreated }: AddClientDialogProps) {
  const toast = useToast();
  const create = useCreateClient();
  return (
    <Dialog open={open} onClose={onClose} title="Add a client" size="lg">
      <ClientForm
        defaultValues={emptyClient()}
        submitLabel="Save client"
        onCancel={onClose}
        onSubmit={async (values) => {
          const client = await create.mutateAsync(values);
          toast(`${client.name} added`);
          onCreated(client);
        }}
      />
    </Dialog>
  );
}

type EditClientDialogProps = { open: boolean; onClose: () => void; client: ClientDetailDto };

export function EditClientDialog({ open, onClose, client }: EditClientDialogProps) {
  const toast = useToast();
  const update = useUpdateClient(client.id);
  return (
    <Dialog open={open} onClose={onClose} title={`Edit ${client.name}`} size="lg">
      <ClientForm
        defaultValues={clientToFormValues(client)}
        submitLabel="Save changes"
        onCancel={onClose}
        onSubmit={async (values) => {
          // Contacts always go along: the API replaces the list with what the form shows.
          const saved = await update.mutateAsync({ ...values, contacts: values.contacts ?? [] });
          toast(`${saved.name} saved`);
          onClose();
        }}
      />
    </Dialog>
  );
}
