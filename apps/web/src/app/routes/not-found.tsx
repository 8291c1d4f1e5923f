import { Link } from "react-router";
import { buttonStyles } from "../../components/ui/button.tsx";
import { paths } from "../../config/paths.ts";

export function NotFoundRoute() {
  return (
    <section className="mx-auto max-w-lg py-16 text-center">
      <p className="text-sm font-semibold tracking-wide text-rust uppercase">404</p>
      <h1 className="mt-2 text-2xl font-semibold">Page not found</h1>
      <p className="mt-3 text-muted">Nothing lives at this address. It may have moved, or the link has a typo.</p>
      <Link to={paths.home.getHref()} className={buttonStyles("secondary", "md", "mt-6")}>
        Go to your home page
      </Link>
    </section>
  );
}
