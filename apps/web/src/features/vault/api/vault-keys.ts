export const vaultKeys = {
  all: ["vault"] as const,
  reels: () => [...vaultKeys.all, "reels"] as const,
  reelList: (filters: Record<string, unknown>) => [...vaultKeys.reels(), "list", filters] as const,
  reel: (id: number) => [...vaultKeys.reels(), "detail", id] as const,
  recorders: () => [...vaultKeys.all, "recorders"] as const,
};
