import type { ContactDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Card } from "../../../components/ui/card.tsx";

export function ClientContacts({ contacts }: { contacts: ContactDto[] }) {
  return (
    <Card title="Contacts">
      {contacts.length === 0 ? (
        <p className="text-sm text-muted">No contacts on file.</p>
      ) : (
        <ul className="-my-3 divide-y divide-line">
          {contacts.map((contact) => (
            <li key={contact.id} className="py-2.5 text-sm">
              <p className="flex flex-wrap items-center gap-2 font-medium">
                {contact.name}
                {contact.isPrimary ? <Badge tone="accent">Primary</Badge> : null}
              </p>
              <p className="break-all text-muted">
                {[contact.email, contact.phone].filter(Boolean).join(" · ") || "No e-mail or phone"}
              </p>
              {contact.note ? <p className="text-muted">{contact.note}</p> : null}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
