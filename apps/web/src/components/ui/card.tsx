import { useId, type ReactNode } from "react";
import { cx } from "../../lib/cx.ts";

type CardProps = { title?: string; actions?: ReactNode; children: ReactNode; className?: string };

export function Card({ title, actions, children, className }: CardProps) {
  const titleId = useId();
  return (
    // Named by its title, so a card can be found (and jumped to) by what it is about.
    <section aria-labelledby={title ? titleId : undefined} className={cx("rounded-lg border border-line bg-card", className)}>
      {title ? (
        <div className="flex items-center justify-between gap-3 border-b border-line px-4 py-3">
          <h2 id={titleId} className="font-semibold">
            {title}
          </h2>
          {actions}
        </div>
      ) : null}
      <div className="px-4 py-3">{children}</div>
    </section>
  );
}
