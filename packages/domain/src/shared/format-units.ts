/** 150 → "2 h 30 min"; 45 → "45 min"; 180 → "3 h". */
export function formatDuration(minutes: number): string {
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

/** 2500 → "25%"; 1250 → "12.5%". */
export function formatPercent(bp: number): string {
  return `${new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 }).format(bp / 100)}%`;
}
