import type { ReactNode } from "react";
import { ApiError, errorMessage } from "../../lib/api-client.ts";
import { Button } from "./button.tsx";
import { NotAllowed } from "./not-allowed.tsx";
import { Spinner } from "./spinner.tsx";

export function LoadingState({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" className="flex items-center justify-center gap-2 py-12 text-sm text-muted">
      <Spinner />
      <span>{label}</span>
    </div>
  );
}

type ErrorStateProps = { error: unknown; onRetry?: () => void; title?: string };

export function ErrorState({ error, onRetry, title = "This could not be loaded" }: ErrorStateProps) {
  if (error instanceof ApiError && error.status === 403) return <NotAllowed />;
  return (
    <div role="alert" className="rounded-lg border border-line bg-card px-5 py-8 text-center">
      <h2 className="font-semibold">{title}</h2>
      <p className="mt-1 text-sm text-muted">{errorMessage(error)}</p>
      {onRetry ? (
        <Button variant="secondary" className="mt-4" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-line-strong px-5 py-10 text-center">
      <p className="font-semibold">{title}</p>
      {children ? <div className="mt-1 text-sm text-muted">{children}</div> : null}
    </div>
  );
}
