export const studioKeys = {
  all: ["studio"] as const,
  detail: () => [...studioKeys.all, "detail"] as const,
};
