import { useRouteError } from "react-router";
import { Button } from "../../components/ui/button.tsx";
import { errorMessage } from "../../lib/api-client.ts";

/** Last resort when a screen crashes: say so plainly and offer a way out. */
export function RouteError() {
  const error = useRouteError();
  return (
    <main className="mx-auto max-w-lg px-4 py-20 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-3 text-muted">{errorMessage(error)}</p>
      <Button className="mt-6" onClick={() => window.location.reload()}>
        Reload the page
      </Button>
    </main>
  );
}
