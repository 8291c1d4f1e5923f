import type { ReactNode } from "react";

type PageHeaderProps = { title: string; eyebrow?: string; description?: ReactNode; actions?: ReactNode };

export function PageHeader({ title, eyebrow, description, actions }: PageHeaderProps) {
  return (
    <header className="mb-6 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <div className="min-w-0">
        {eyebrow ? <p className="text-sm font-semibold text-muted">{eyebrow}</p> : null}
        <h1 className="text-2xl font-semibold tracking-tight break-words">{title}</h1>
        {description ? <div className="mt-1 text-muted">{description}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}
