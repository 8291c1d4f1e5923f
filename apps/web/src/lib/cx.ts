/** Joins class names, skipping the falsy ones that conditional styling produces. */
export const cx = (...names: (string | false | null | undefined)[]) => names.filter(Boolean).join(" ");
