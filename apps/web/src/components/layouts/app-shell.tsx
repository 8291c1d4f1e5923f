import { useEffect, useId, useState, type ReactNode } from "react";
import type { NavItem } from "../../config/navigation.ts";
import { Link } from "react-router";
import { paths } from "../../config/paths.ts";
import { Button } from "../ui/button.tsx";
import { BrandMark } from "./brand-mark.tsx";
import { SideNav } from "./side-nav.tsx";

type AppShellProps = {
  studioName: string;
  person: { name: string; roleLabel: string };
  items: NavItem[];
  onSignOut: () => void;
  signingOut?: boolean;
  children: ReactNode;
};

export function AppShell({ studioName, person, items, onSignOut, signingOut, children }: AppShellProps) {
  const [menuOpen, setMenuOpen] = useState(false);
  const menuId = useId();

  useEffect(() => {
    if (!menuOpen) return;
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key === "Escape") setMenuOpen(false);
    };
    document.addEventListener("keydown", onKeyDown);
    return () => document.removeEventListener("keydown", onKeyDown);
  }, [menuOpen]);

  const account = (
    <div className="border-t border-line pt-3">
      <p className="truncate font-semibold">{person.name}</p>
      <p className="text-sm text-muted">{person.roleLabel}</p>
      <Link to={paths.profile.getHref()} className="text-sm underline underline-offset-2">
        Your profile
      </Link>
      <Button variant="secondary" size="sm" className="mt-2 w-full" onClick={onSignOut} pending={signingOut}>
        Sign out
      </Button>
    </div>
  );

  return (
    <div className="min-h-dvh md:flex">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-ink px-3 py-2 text-paper focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>

      <aside className="hidden w-60 shrink-0 flex-col border-r border-line bg-paper-deep/50 px-3 py-4 md:sticky md:top-0 md:flex md:h-dvh">
        <StudioName name={studioName} />
        <div className="mt-4 mb-2 flex-1 overflow-y-auto">
          <SideNav items={items} />
        </div>
        {account}
      </aside>

      <header className="sticky top-0 z-30 border-b border-line bg-paper/95 backdrop-blur md:hidden">
        <div className="flex h-14 items-center justify-between gap-3 px-4">
          <StudioName name={studioName} />
          <Button
            variant="secondary"
            size="sm"
            aria-expanded={menuOpen}
            aria-controls={menuId}
            onClick={() => setMenuOpen((open) => !open)}
          >
            Menu
          </Button>
        </div>
        {menuOpen ? (
          <div id={menuId} className="border-t border-line px-3 pt-3 pb-4">
            <SideNav items={items} onNavigate={() => setMenuOpen(false)} />
            <div className="mt-3">{account}</div>
          </div>
        ) : null}
      </header>

      <main id="main" className="min-w-0 flex-1 px-4 py-6 sm:px-6 md:px-10 md:py-8">
        <div className="mx-auto max-w-6xl">{children}</div>
      </main>
    </div>
  );
}

function StudioName({ name }: { name: string }) {
  return (
    <div className="flex min-w-0 items-center gap-2.5 px-1">
      <BrandMark className="size-7 shrink-0" />
      <div className="min-w-0 leading-tight">
        <p className="truncate font-semibold">{name}</p>
        <p className="text-xs text-muted">Takeup</p>
      </div>
    </div>
  );
}
