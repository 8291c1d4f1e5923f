import { useSyncExternalStore } from "react";

const query = "(min-width: 768px)";

const media = () => (typeof window !== "undefined" && typeof window.matchMedia === "function" ? window.matchMedia(query) : null);

function subscribe(onChange: () => void) {
  const list = media();
  list?.addEventListener("change", onChange);
  return () => list?.removeEventListener("change", onChange);
}

/**
 * True on a tablet or desktop, false on a phone: wide tables there, cards on a phone, so a
 * phone never scrolls sideways to reach a button. Without matchMedia (tests), the wide layout.
 */
export const useWideScreen = () =>
  useSyncExternalStore(
    subscribe,
    () => media()?.matches ?? true,
    () => true,
  );
