export const tapeKeys = {
  all: ["tape"] as const,
  products: () => [...tapeKeys.all, "products"] as const,
  movements: (productId: number) => [...tapeKeys.all, "movements", productId] as const,
  customers: () => [...tapeKeys.all, "customers"] as const,
  projects: (clientId: number) => [...tapeKeys.all, "projects", clientId] as const,
  recorders: () => [...tapeKeys.all, "recorders"] as const,
};
