import { useId, type ReactNode } from "react";
import { cx } from "../../lib/cx.ts";

export type CheckListItem = { value: string; label: string; detail?: ReactNode };

type CheckListProps = {
  legend: string;
  items: CheckListItem[];
  value: readonly string[];
  onChange: (next: string[]) => void;
  empty?: string;
  className?: string;
  /** Caps the height; a long list scrolls inside. */
  scroll?: boolean;
};

/** A group of checkboxes holding a list of chosen values; each box is named by its label alone. */
export function CheckList({ legend, items, value, onChange, empty = "Nothing to choose from.", className, scroll = false }: CheckListProps) {
  const id = useId();
  const toggle = (item: string, checked: boolean) =>
    onChange(checked ? [...value.filter((v) => v !== item), item] : value.filter((v) => v !== item));
  return (
    <fieldset className={cx("min-w-0", className)}>
      <legend className="text-sm font-semibold">{legend}</legend>
      {items.length === 0 ? <p className="mt-1 text-sm text-muted">{empty}</p> : null}
      <ul className={cx("mt-1.5 flex flex-col gap-1", scroll && "max-h-44 overflow-y-auto")}>
        {items.map((item, index) => (
          <li key={item.value} className="flex min-w-0 items-center gap-2 text-sm">
            <input
              id={`${id}-${index}`}
              type="checkbox"
              className="size-4 shrink-0 accent-rust"
              checked={value.includes(item.value)}
              onChange={(event) => toggle(item.value, event.target.checked)}
            />
            <label htmlFor={`${id}-${index}`} className="truncate">
              {item.label}
            </label>
            {item.detail ? <span className="shrink-0 text-xs text-muted">{item.detail}</span> : null}
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
