/**
 * Minor units per currency, from the ISO 4217 list one (2024-06-25). Kept as our own table
 * because Node's Intl follows CLDR, which differs for IQD, HUF, IDR, COP and others.
 */
const isoMinorUnits: Record<string, number> = {
  USD: 2, EUR: 2, GBP: 2, CAD: 2, AUD: 2, NZD: 2, CHF: 2, SEK: 2, NOK: 2, DKK: 2, MXN: 2,
  HUF: 2, IDR: 2, COP: 2, ZAR: 2, INR: 2, BRL: 2, PLN: 2, CZK: 2,
  JPY: 0, KRW: 0, ISK: 0, CLP: 0,
  BHD: 3, KWD: 3, JOD: 3, OMR: 3, IQD: 3,
  CLF: 4,
};

export const supportedCurrencies = Object.keys(isoMinorUnits).sort();

export function minorUnits(currency: string): number {
  const units = isoMinorUnits[currency.toUpperCase()];
  if (units === undefined) throw new RangeError(`Unknown currency ${currency}`);
  return units;
}

/** Formats integer minor units for display, e.g. 85000 USD → "$850.00". */
export function formatMoney(amountMinor: number, currency: string, locale = "en-US"): string {
  if (!Number.isInteger(amountMinor)) throw new RangeError("Money must be integer minor units");
  const digits = minorUnits(currency);
  return new Intl.NumberFormat(locale, {
    style: "currency",
    currency,
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(amountMinor / 10 ** digits);
}
