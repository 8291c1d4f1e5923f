import { Link } from "react-router";

type StatCardProps = { label: string; value: number | string; detail?: string; href?: string; linkLabel?: string };

export function StatCard({ label, value, detail, href, linkLabel }: StatCardProps) {
  return (
    <section className="flex flex-col rounded-lg border border-line bg-card px-4 py-4">
      <h2 className="text-sm font-semibold text-muted">{label}</h2>
      <p className="mt-1 text-3xl font-semibold tabular-nums">{value}</p>
      {detail ? <p className="mt-0.5 text-sm text-muted">{detail}</p> : null}
      {href && linkLabel ? (
        <Link to={href} className="mt-3 text-sm font-medium text-rust-deep underline-offset-2 hover:underline">
          {linkLabel}
        </Link>
      ) : null}
    </section>
  );
}
