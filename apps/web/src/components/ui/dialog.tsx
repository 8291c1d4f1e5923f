import { useEffect, useId, useRef, type ReactNode } from "react";
import { createPortal } from "react-dom";
import { cx } from "../../lib/cx.ts";

const focusable =
  'a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

type DialogProps = {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  size?: "sm" | "md" | "lg" | "xl";
  children: ReactNode;
};

const widths = { sm: "max-w-md", md: "max-w-lg", lg: "max-w-2xl", xl: "max-w-5xl" };

// Open panels, innermost last: a confirmation opened from a panel handles Escape and Tab,
// and the panel behind it waits until it closes.
const openPanels: HTMLElement[] = [];

export function Dialog({ open, ...props }: DialogProps) {
  if (!open) return null;
  return createPortal(<DialogPanel {...props} />, document.body);
}

function DialogPanel({ onClose, title, description, size = "md", children }: Omit<DialogProps, "open">) {
  const panelRef = useRef<HTMLDivElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  const onCloseRef = useRef(onClose);
  useEffect(() => {
    onCloseRef.current = onClose;
  });

  useEffect(() => {
    // Focus goes back where it came from, so keyboard users do not lose their place.
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const panel = panelRef.current;
    if (!panel) return;
    // The first field of the content, not the close button, is where people start typing.
    const first =
      panel.querySelector<HTMLElement>("[data-autofocus]") ??
      panel.querySelector("[data-dialog-body]")?.querySelector<HTMLElement>(focusable) ??
      panel.querySelector<HTMLElement>(focusable);
    (first ?? panel).focus();
    openPanels.push(panel);
    const { overflow } = document.body.style;
    document.body.style.overflow = "hidden";

    // Listening on the document keeps Escape and the Tab trap working even if focus strayed.
    const onKeyDown = (event: KeyboardEvent) => {
      if (openPanels[openPanels.length - 1] !== panel) return;
      if (event.key === "Escape") {
        event.preventDefault();
        onCloseRef.current();
        return;
      }
      if (event.key !== "Tab") return;
      const items = Array.from(panel.querySelectorAll<HTMLElement>(focusable));
      const head = items[0];
      const tail = items[items.length - 1];
      if (!head || !tail) return;
      const active = document.activeElement;
      if (!panel.contains(active)) {
        event.preventDefault();
        head.focus();
      } else if (event.shiftKey && active === head) {
        event.preventDefault();
        tail.focus();
      } else if (!event.shiftKey && active === tail) {
        event.preventDefault();
        head.focus();
      }
    };
    document.addEventListener("keydown", onKeyDown);
    return () => {
      document.removeEventListener("keydown", onKeyDown);
      openPanels.splice(openPanels.indexOf(panel), 1);
      document.body.style.overflow = overflow;
      opener?.focus();
    };
  }, []);

  return (
    <div
      className="fixed inset-0 z-40 flex items-start justify-center overflow-y-auto bg-ink/40 px-3 py-6 sm:py-16"
      // A click on the backdrop must not pull focus out of the dialog.
      onMouseDown={(event) => {
        if (event.target === event.currentTarget) event.preventDefault();
      }}
    >
      <div
        ref={panelRef}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        aria-describedby={description ? descriptionId : undefined}
        tabIndex={-1}
        className={cx("w-full rounded-lg border border-line bg-card shadow-xl outline-none", widths[size])}
      >
        <div className="flex items-start justify-between gap-4 border-b border-line px-5 py-4">
          <div>
            <h2 id={titleId} className="text-lg font-semibold">
              {title}
            </h2>
            {description ? (
              <div id={descriptionId} className="mt-1 text-sm text-muted">
                {description}
              </div>
            ) : null}
          </div>
          <button
            type="button"
            onClick={onClose}
            aria-label="Close"
            className="-mr-1 rounded-md p-1 text-muted hover:bg-paper-deep hover:text-ink"
          >
            <svg viewBox="0 0 16 16" className="size-4" fill="none" aria-hidden="true">
              <path d="M4 4l8 8M12 4l-8 8" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
            </svg>
          </button>
        </div>
        <div data-dialog-body className="px-5 py-4">
          {children}
        </div>
      </div>
    </div>
  );
}

/** The row of buttons at the foot of a dialog; the main action comes last, as readers expect. */
export function DialogActions({ children }: { children: ReactNode }) {
  return <div className="mt-5 flex flex-wrap justify-end gap-2">{children}</div>;
}
