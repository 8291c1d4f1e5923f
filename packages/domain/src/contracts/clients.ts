import { z } from "zod";
import { emailAddress, idParams, optionalEmail, optionalText, personName, userIdParams } from "./common.ts";
import { defineRoute } from "./route.ts";
import { pendingInvitationDto } from "./staff.ts";

export const clientKinds = ["band", "producer", "label"] as const;
export type ClientKind = (typeof clientKinds)[number];
export const clientKindLabels: Record<ClientKind, string> = { band: "Band", producer: "Producer", label: "Label" };

export const contactInput = z.strictObject({
  name: personName,
  email: optionalEmail,
  phone: optionalText(40),
  note: optionalText(120),
  isPrimary: z.boolean().optional(),
});
export type ContactInput = z.infer<typeof contactInput>;

const clientFields = {
  name: z.string().trim().min(1, "Enter the client's name").max(120, "Use at most 120 characters"),
  kind: z.enum(clientKinds, "Choose band, producer or label"),
  email: optionalEmail,
  phone: optionalText(40),
  billingAddress: optionalText(500),
  notes: optionalText(2000),
  contacts: z.array(contactInput).max(20, "Keep to 20 contacts").optional(),
};

export const createClientInput = z.strictObject(clientFields);
export type CreateClientInput = z.infer<typeof createClientInput>;

export const updateClientInput = createClientInput.partial().extend({ active: z.boolean().optional() });
export type UpdateClientInput = z.infer<typeof updateClientInput>;

export const contactDto = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  note: z.string().nullable(),
  isPrimary: z.boolean(),
});
export type ContactDto = z.infer<typeof contactDto>;

export const clientSummaryDto = z.object({
  id: z.number(),
  name: z.string(),
  kind: z.enum(clientKinds),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  active: z.boolean(),
  primaryContact: z.string().nullable(),
  userCount: z.number(),
});
export type ClientSummaryDto = z.infer<typeof clientSummaryDto>;

export const clientUserDto = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  active: z.boolean(),
});

export const clientDetailDto = clientSummaryDto.extend({
  billingAddress: z.string().nullable(),
  notes: z.string().nullable(),
  contacts: z.array(contactDto),
  users: z.array(clientUserDto),
  invitations: z.array(pendingInvitationDto),
});
export type ClientDetailDto = z.infer<typeof clientDetailDto>;

export const inviteClientUserInput = z.strictObject({ name: personName, email: emailAddress });
export type InviteClientUserInput = z.infer<typeof inviteClientUserInput>;

export const updateClientUserInput = z.strictObject({ active: z.boolean() });

export const clientUserParams = idParams.extend(userIdParams.shape);

const staffWhoBook = ["owner", "manager"] as const;

/** The client-account routes, declared once for the API and the web. */
export const clientRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/clients",
    summary: "All client accounts (bands, producers, labels)",
    access: ["owner", "manager", "bookkeeper"],
    response: z.array(clientSummaryDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/clients",
    summary: "Add a client account with its contacts",
    access: staffWhoBook,
    body: createClientInput,
    status: 201,
    response: clientDetailDto,
  }),
  get: defineRoute({
    method: "get",
    path: "/api/clients/:id",
    summary: "One client account with contacts and sign-ins (a client sees only its own)",
    access: ["owner", "manager", "bookkeeper", "client"],
    params: idParams,
    response: clientDetailDto,
  }),
  update: defineRoute({
    method: "patch",
    path: "/api/clients/:id",
    summary: "Change a client account; contacts, when sent, replace the list",
    access: staffWhoBook,
    params: idParams,
    body: updateClientInput,
    response: clientDetailDto,
  }),
  inviteUser: defineRoute({
    method: "post",
    path: "/api/clients/:id/invitations",
    summary: "Invite a client user to this account by e-mail",
    access: staffWhoBook,
    params: idParams,
    body: inviteClientUserInput,
    status: 201,
    response: pendingInvitationDto,
  }),
  setUserActive: defineRoute({
    method: "patch",
    path: "/api/clients/:id/users/:userId",
    summary: "Deactivate (ends their sessions at once) or reactivate a client user",
    access: staffWhoBook,
    params: clientUserParams,
    body: updateClientUserInput,
    response: clientDetailDto,
  }),
};
