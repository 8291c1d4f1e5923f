import { Outlet } from "react-router";
import { roleLabels } from "@takeup/domain";
import { AppShell } from "../../components/layouts/app-shell.tsx";
import { useToast } from "../../components/ui/use-toast.ts";
import { navigationFor } from "../../config/navigation.ts";
import { paths } from "../../config/paths.ts";
import { useSignOut } from "../../features/auth/api/sign-out.ts";
import { useStudio } from "../../features/studio/api/get-studio.ts";
import { errorMessage } from "../../lib/api-client.ts";
import { RequireRole } from "../require-role.tsx";
import { useSignedInUser } from "../use-signed-in-user.ts";

export function AppRoot() {
  return (
    <RequireRole>
      <SignedInShell />
    </RequireRole>
  );
}

function SignedInShell() {
  const me = useSignedInUser();
  const studio = useStudio();
  const toast = useToast();
  const signOut = useSignOut({
    // A full page load wipes everything the session loaded from memory, not just the cache.
    onSuccess: () => window.location.replace(paths.signIn.getHref()),
    onError: (error) => toast(errorMessage(error), "error"),
  });

  return (
    <AppShell
      studioName={studio.data?.name ?? "Takeup"}
      person={{ name: me.name, roleLabel: me.clientAccount ? `${roleLabels[me.role]} · ${me.clientAccount.name}` : roleLabels[me.role] }}
      items={navigationFor(me.role)}
      onSignOut={() => signOut.mutate()}
      signingOut={signOut.isPending || signOut.isSuccess}
    >
      <Outlet />
    </AppShell>
  );
}
