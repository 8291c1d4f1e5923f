import { formatMoney, type BookingDto } from "@takeup/domain";

type Quote = BookingDto["quote"];

type QuoteBreakdownProps = {
  quote: Quote;
  depositRequiredCents: number;
  /** Shown as the heading of the list, e.g. "Price" or "Quoted price". */
  label?: string;
};

/** Every line of a price with its reason, the total, the rate card it came from and the deposit. */
export function QuoteBreakdown({ quote, depositRequiredCents, label = "Price" }: QuoteBreakdownProps) {
  const money = (cents: number) => formatMoney(cents, quote.currency);
  return (
    <section aria-label={label} className="flex flex-col gap-2">
      <ul className="divide-y divide-line rounded-md border border-line bg-card">
        {quote.lines.map((line, index) => (
          <li key={`${line.kind}-${line.date ?? ""}-${line.engineerId ?? ""}-${index}`} className="flex items-start justify-between gap-3 px-3 py-2 text-sm">
            <div className="min-w-0">
              <p className="font-medium">{line.label}</p>
              <p className="text-xs text-muted">{line.explanation}</p>
            </div>
            <p className="shrink-0 font-medium tabular-nums">{money(line.amountCents)}</p>
          </li>
        ))}
        {quote.lines.length === 0 ? <li className="px-3 py-2 text-sm text-muted">Nothing to charge.</li> : null}
      </ul>
      <div className="flex flex-wrap items-baseline justify-between gap-2 px-1">
        <p className="text-xs text-muted">{quote.rateCardLabel}</p>
        <p className="text-base font-semibold tabular-nums">Total {money(quote.totalCents)}</p>
      </div>
      <p className="px-1 text-sm text-muted">
        {depositRequiredCents > 0 ? (
          <>
            Deposit required: <span className="font-semibold text-ink tabular-nums">{money(depositRequiredCents)}</span>
          </>
        ) : (
          "No deposit required."
        )}
      </p>
    </section>
  );
}
