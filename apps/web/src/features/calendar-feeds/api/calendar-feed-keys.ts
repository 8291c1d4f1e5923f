export const calendarFeedKeys = {
  all: ["calendar-feeds"] as const,
  list: () => [...calendarFeedKeys.all, "list"] as const,
};
