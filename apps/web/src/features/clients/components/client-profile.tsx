import type { ReactNode } from "react";
import { clientKindLabels, type ClientDetailDto } from "@takeup/domain";
import { Card } from "../../../components/ui/card.tsx";

type ClientProfileProps = { client: ClientDetailDto; showNotes: boolean };

export function ClientProfile({ client, showNotes }: ClientProfileProps) {
  return (
    <Card title="Details">
      <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-2">
        <Item term="Kind">{clientKindLabels[client.kind]}</Item>
        <Item term="Status">{client.active ? "Active" : "Inactive"}</Item>
        <Item term="E-mail">{client.email}</Item>
        <Item term="Phone">{client.phone}</Item>
        <Item term="Billing address" wide>
          {client.billingAddress}
        </Item>
        {showNotes ? (
          <Item term="Notes" wide>
            {client.notes}
          </Item>
        ) : null}
      </dl>
    </Card>
  );
}

function Item({ term, wide, children }: { term: string; wide?: boolean; children: ReactNode }) {
  return (
    <div className={wide ? "sm:col-span-2" : undefined}>
      <dt className="text-muted">{term}</dt>
      <dd className="mt-0.5 break-words whitespace-pre-line">{children || <span className="text-muted">Not given</span>}</dd>
    </div>
  );
}
