import { useState } from "react";
import type { CaughtMessageDto } from "@takeup/domain";
import { EmptyState } from "../../../components/ui/states.tsx";
import { cx } from "../../../lib/cx.ts";
import { formatStudioDateTime } from "../../../lib/dates.ts";
import { LinkedText } from "./linked-text.tsx";

type CaughtMailProps = { messages: CaughtMessageDto[]; timeZone: string };

export function CaughtMail({ messages, timeZone }: CaughtMailProps) {
  const [openId, setOpenId] = useState<string | null>(null);
  if (messages.length === 0) {
    return <EmptyState title="No e-mail caught yet.">Invitations and reset links sent from Takeup show up here.</EmptyState>;
  }
  const open = messages.find((m) => m.id === openId) ?? messages[0];

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <ul aria-label="Caught messages" className="divide-y divide-line self-start overflow-hidden rounded-lg border border-line bg-card">
        {messages.map((message) => {
          const current = message.id === open?.id;
          return (
            <li key={message.id}>
              <button
                type="button"
                aria-current={current || undefined}
                onClick={() => setOpenId(message.id)}
                className={cx("block w-full px-4 py-2.5 text-left text-sm hover:bg-paper", current && "bg-rust-wash")}
              >
                <span className="block truncate font-medium">{message.subject || "(no subject)"}</span>
                <span className="block truncate text-muted">To {message.to.join(", ")}</span>
                <span className="block text-xs text-muted">{formatStudioDateTime(message.receivedAt, timeZone)}</span>
              </button>
            </li>
          );
        })}
      </ul>
      {open ? (
        <article aria-label="Open message" className="min-w-0 rounded-lg border border-line bg-card">
          <header className="border-b border-line px-4 py-3 text-sm">
            <h2 className="text-base font-semibold break-words">{open.subject || "(no subject)"}</h2>
            <p className="mt-1 break-all text-muted">From {open.from}</p>
            <p className="break-all text-muted">To {open.to.join(", ")}</p>
            <p className="text-muted">{formatStudioDateTime(open.receivedAt, timeZone)}</p>
          </header>
          <div className="px-4 py-3 text-sm leading-relaxed break-words whitespace-pre-wrap">
            <LinkedText text={open.text} />
          </div>
        </article>
      ) : null}
    </div>
  );
}
