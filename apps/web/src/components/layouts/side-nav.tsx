import { NavLink } from "react-router";
import type { NavItem } from "../../config/navigation.ts";
import { cx } from "../../lib/cx.ts";

type SideNavProps = { items: NavItem[]; onNavigate?: () => void };

export function SideNav({ items, onNavigate }: SideNavProps) {
  return (
    <nav aria-label="Main">
      <ul className="flex flex-col gap-0.5">
        {items.map((item, index) => (
          <li key={item.href}>
            {item.group && item.group !== items[index - 1]?.group ? (
              <p aria-hidden="true" className="mt-3 mb-1 px-3 text-xs font-semibold tracking-wide text-muted uppercase">
                {item.group}
              </p>
            ) : null}
            <NavLink
              to={item.href}
              // Home is "/", which every path starts with; only an exact match marks it current.
              end={item.href === "/"}
              onClick={onNavigate}
              className={({ isActive }) =>
                cx(
                  "flex items-center rounded-md border-l-[3px] px-3 py-1.5 text-[0.9375rem] font-medium transition-colors",
                  isActive
                    ? "border-rust bg-rust-wash text-rust-deep"
                    : "border-transparent text-ink hover:bg-paper-deep",
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
