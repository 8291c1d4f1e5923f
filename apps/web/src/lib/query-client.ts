import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { ApiError } from "./api-client.ts";

type Options = {
  /** Called when the API says the session is gone, so the app can send the person to sign in. */
  onSignedOut?: () => void;
  retry?: boolean;
};

// A wrong password is also a 401, but it does not mean an existing session ended.
const endsSession = (error: unknown) =>
  error instanceof ApiError && error.status === 401 && error.code !== "invalid_credentials";

export function createQueryClient({ onSignedOut, retry = true }: Options = {}) {
  const onError = (error: unknown) => {
    if (endsSession(error)) onSignedOut?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Asking again will not change a 4xx answer; only retry what might be a hiccup.
        retry: (failures, error) => {
          if (!retry) return false;
          if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
          return failures < 2;
        },
      },
      mutations: { retry: false },
    },
  });
}
