import { useState, type ReactNode } from "react";
import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { ToastProvider } from "../components/ui/toast.tsx";
import { endSession } from "../features/auth/api/get-me.ts";
import { createQueryClient } from "../lib/query-client.ts";

export function createAppQueryClient({ retry = true }: { retry?: boolean } = {}): QueryClient {
  // A 401 on any request means the session ended elsewhere (expired, or deactivated by the owner).
  const client = createQueryClient({ retry, onSignedOut: () => endSession(client) });
  return client;
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return (
    <QueryClientProvider client={client}>
      <ToastProvider>{children}</ToastProvider>
    </QueryClientProvider>
  );
}
