import type { ReactNode } from "react";
import { BrandMark } from "./brand-mark.tsx";

type AuthLayoutProps = { title: string; intro?: ReactNode; children: ReactNode };

/** The quiet single-card frame of the screens people see before they are signed in. */
export function AuthLayout({ title, intro, children }: AuthLayoutProps) {
  return (
    <div className="flex min-h-dvh flex-col items-center px-4 py-10 sm:py-20">
      <div className="mb-6 flex items-center gap-2.5">
        <BrandMark className="size-8" />
        <span className="text-lg font-semibold tracking-tight">Takeup</span>
      </div>
      <main className="w-full max-w-sm rounded-lg border border-line bg-card px-5 py-6 shadow-sm sm:px-6">
        <h1 className="text-xl font-semibold">{title}</h1>
        {intro ? <div className="mt-1.5 text-sm text-muted">{intro}</div> : null}
        <div className="mt-5">{children}</div>
      </main>
    </div>
  );
}
