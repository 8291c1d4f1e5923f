/** Shown wherever tax figures are set or previewed (BRIEF.md, cautions). */
export function TaxCaution() {
  return (
    <p className="rounded-md border border-line bg-paper-deep px-3 py-2 text-sm text-muted">
      Tax rates, per-line or per-invoice calculation and rounding are this studio's own settings. Your tax authority and your accountant decide what applies;
      nothing here is tax advice.
    </p>
  );
}
