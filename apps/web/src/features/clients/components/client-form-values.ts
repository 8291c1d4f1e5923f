import type { z } from "zod";
import type { ClientDetailDto, createClientInput } from "@takeup/domain";

export type ClientFormValues = z.input<typeof createClientInput>;
export type ContactFormValues = NonNullable<ClientFormValues["contacts"]>[number];

export const emptyContact = (isPrimary: boolean): ContactFormValues => ({ name: "", email: "", phone: "", note: "", isPrimary });

export const emptyClient = (): ClientFormValues => ({
  name: "",
  kind: "band",
  email: "",
  phone: "",
  billingAddress: "",
  notes: "",
  contacts: [emptyContact(true)],
});

/** The API answers with nulls and ids; the form (and the strict schema) wants plain strings. */
export const clientToFormValues = (client: ClientDetailDto): ClientFormValues => ({
  name: client.name,
  kind: client.kind,
  email: client.email ?? "",
  phone: client.phone ?? "",
  billingAddress: client.billingAddress ?? "",
  notes: client.notes ?? "",
  contacts: client.contacts.map((c) => ({
    name: c.name,
    email: c.email ?? "",
    phone: c.phone ?? "",
    note: c.note ?? "",
    isPrimary: c.isPrimary,
  })),
});
