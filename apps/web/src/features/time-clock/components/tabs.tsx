import { useId, useRef, type KeyboardEvent, type ReactNode } from "react";
import { cx } from "../../../lib/cx.ts";

export type Tab<K extends string> = { key: K; label: string; panel: ReactNode };

type TabsProps<K extends string> = { label: string; tabs: Tab<K>[]; selected: K; onSelect: (key: K) => void };

/** Tabs as the ARIA pattern has them: arrow keys, Home and End move between tabs; Tab goes into the panel. */
export function Tabs<K extends string>({ label, tabs, selected, onSelect }: TabsProps<K>) {
  const id = useId();
  const refs = useRef(new Map<K, HTMLButtonElement>());
  const move = (event: KeyboardEvent, index: number) => {
    const last = tabs.length - 1;
    const next = event.key === "ArrowRight" ? (index === last ? 0 : index + 1) : event.key === "ArrowLeft" ? (index === 0 ? last : index - 1) : event.key === "Home" ? 0 : event.key === "End" ? last : null;
    if (next === null) return;
    event.preventDefault();
    const tab = tabs[next];
    if (!tab) return;
    onSelect(tab.key);
    refs.current.get(tab.key)?.focus();
  };
  const current = tabs.find((t) => t.key === selected) ?? tabs[0];
  return (
    <div>
      <div role="tablist" aria-label={label} className="flex gap-1 border-b border-line">
        {tabs.map((tab, index) => {
          const active = tab.key === current?.key;
          return (
            <button
              key={tab.key}
              ref={(node) => {
                if (node) refs.current.set(tab.key, node);
                else refs.current.delete(tab.key);
              }}
              type="button"
              role="tab"
              id={`${id}-tab-${tab.key}`}
              aria-selected={active}
              aria-controls={`${id}-panel-${tab.key}`}
              tabIndex={active ? 0 : -1}
              onClick={() => onSelect(tab.key)}
              onKeyDown={(event) => move(event, index)}
              className={cx(
                "-mb-px rounded-t-md border-b-2 px-4 py-2 text-sm font-semibold whitespace-nowrap",
                active ? "border-rust text-ink" : "border-transparent text-muted hover:text-ink",
              )}
            >
              {tab.label}
            </button>
          );
        })}
      </div>
      {current ? (
        <div role="tabpanel" id={`${id}-panel-${current.key}`} aria-labelledby={`${id}-tab-${current.key}`} className="pt-4">
          {current.panel}
        </div>
      ) : null}
    </div>
  );
}
