import type { ReactNode } from "react";
import { Navigate, useLocation } from "react-router";
import type { Role } from "@takeup/domain";
import { paths } from "../config/paths.ts";
import { NotAllowed } from "../components/ui/not-allowed.tsx";
import { ErrorState, LoadingState } from "../components/ui/states.tsx";
import { useMe } from "../features/auth/api/get-me.ts";

type RequireRoleProps = {
  /** Leave out to let in anyone signed in. */
  roles?: readonly Role[];
  children: ReactNode;
};

export function RequireRole({ roles, children }: RequireRoleProps) {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) return <LoadingState />;
  if (me.isError) return <ErrorState error={me.error} onRetry={() => void me.refetch()} />;
  if (!me.data) {
    return <Navigate to={paths.signIn.getHref(location.pathname + location.search)} replace />;
  }
  if (roles && !roles.includes(me.data.role)) return <NotAllowed />;
  return children;
}
