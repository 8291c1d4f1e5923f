import type { ReactNode } from "react";
import { render } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createMemoryRouter, RouterProvider, type RouteObject } from "react-router";
import { AppProvider, createAppQueryClient } from "../app/provider.tsx";

type Options = { at?: string; routes?: RouteObject[] };

/**
 * Renders with the app's real providers and a fresh QueryClient, inside a memory router.
 * Without `routes`, the element is mounted at every path and "/sign-in" shows a marker page.
 */
export function renderWithApp(ui: ReactNode, { at = "/", routes }: Options = {}) {
  const queryClient = createAppQueryClient({ retry: false });
  const router = createMemoryRouter(
    routes ?? [
      { path: "/sign-in", element: <p>Sign-in page</p> },
      { path: "*", element: ui },
    ],
    { initialEntries: [at] },
  );
  const user = userEvent.setup();
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, user, router, queryClient };
}
