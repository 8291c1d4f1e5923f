export const roomKeys = {
  all: ["rooms"] as const,
  lists: () => [...roomKeys.all, "list"] as const,
  list: () => [...roomKeys.lists()] as const,
  rateCards: (roomId: number) => [...roomKeys.all, "rate-cards", roomId] as const,
  equipment: () => [...roomKeys.all, "equipment"] as const,
  engineerRates: () => [...roomKeys.all, "engineer-rates"] as const,
  engineers: () => [...roomKeys.all, "engineers"] as const,
};
