import { Link, Navigate, useNavigate, useSearchParams } from "react-router";
import { AuthLayout } from "../../../components/layouts/auth-layout.tsx";
import { paths, safeNext } from "../../../config/paths.ts";
import { useMe } from "../../../features/auth/api/get-me.ts";
import { SignInForm } from "../../../features/auth/components/sign-in-form.tsx";

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNext(params.get("next"));

  if (me.data) return <Navigate to={next} replace />;

  return (
    <AuthLayout title="Sign in" intro="The back office of your studio.">
      {params.get("notice") === "password-changed" ? (
        <p role="status" className="mb-4 rounded-md border border-line bg-paper px-3 py-2 text-sm">
          Your password has been changed. Sign in with the new one.
        </p>
      ) : null}
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </AuthLayout>
  );
}

export function BackToSignIn() {
  return (
    <p className="mt-5 text-center text-sm">
      <Link to={paths.signIn.getHref()} className="font-medium text-rust underline-offset-2 hover:underline">
        Back to sign in
      </Link>
    </p>
  );
}
