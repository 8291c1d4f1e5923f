const decimal = new Intl.NumberFormat("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/**
 * Decimal hours to two places, as the export has them (whole minutes ÷ 60, rounded once):
 * 2490 minutes → "41.50 h".
 */
export const formatDecimalHours = (minutes: number) => `${decimal.format(Math.round((minutes / 60) * 100) / 100)} h`;
