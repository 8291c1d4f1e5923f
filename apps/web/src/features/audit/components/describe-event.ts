/** "client.created" → "Client created": readable without a table of every action the API may add. */
export function describeAction(action: string): string {
  const words = action.replace(/[._-]+/g, " ").trim();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/**
 * Who did it. A client user chooses their own name, so the client account they really belong to
 * is always shown beside it ("Mara Linden (Owner) · client user of Lantern Static").
 */
export function describeActor(event: { actorName: string | null; actorClientAccountName: string | null }): string {
  if (event.actorName === null) return "System";
  if (event.actorClientAccountName === null) return event.actorName;
  return `${event.actorName} · client user of ${event.actorClientAccountName}`;
}

export function describeEntity(entityType: string, entityId: string): string {
  return `${entityType.replace(/_/g, " ")} ${entityId}`;
}

/** Pretty JSON for the before/after panel; absent sides say so instead of printing "undefined". */
export function showJson(value: unknown): string {
  if (value === undefined || value === null) return "(nothing)";
  return JSON.stringify(value, null, 2);
}
