import { Link } from "react-router";
import { paths } from "../../config/paths.ts";
import { buttonStyles } from "./button.tsx";

export function NotAllowed() {
  return (
    <section className="mx-auto max-w-lg py-16 text-center">
      <p className="text-sm font-semibold tracking-wide text-rust uppercase">403</p>
      <h1 className="mt-2 text-2xl font-semibold">Not allowed here</h1>
      <p className="mt-3 text-muted">
        You don&apos;t have access to this page. If you need it for your work, ask the studio owner to change your role.
      </p>
      <Link to={paths.home.getHref()} className={buttonStyles("secondary", "md", "mt-6")}>
        Go to your home page
      </Link>
    </section>
  );
}
