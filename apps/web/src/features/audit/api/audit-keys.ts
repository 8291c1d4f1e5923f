export const auditKeys = {
  all: ["audit-events"] as const,
  list: (limit: number) => [...auditKeys.all, "list", { limit }] as const,
};
