import { Link, useNavigate, useSearchParams } from "react-router";
import { AuthLayout } from "../../../components/layouts/auth-layout.tsx";
import { buttonStyles } from "../../../components/ui/button.tsx";
import { paths } from "../../../config/paths.ts";
import { ResetPasswordForm } from "../../../features/auth/components/reset-password-form.tsx";
import { BackToSignIn } from "./sign-in.tsx";

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get("token");

  if (!token || params.has("error")) {
    return (
      <AuthLayout title="This reset link can't be used" intro="It has expired or was already used. Reset links work once, for a short time.">
        <Link to={paths.forgotPassword.getHref()} className={buttonStyles("primary", "md", "w-full")}>
          Ask for a new link
        </Link>
        <BackToSignIn />
      </AuthLayout>
    );
  }

  return (
    <AuthLayout title="Choose a new password">
      <ResetPasswordForm token={token} onDone={() => navigate(paths.signIn.getHref(undefined, "password-changed"), { replace: true })} />
      <p className="mt-5 text-center text-sm">
        <Link to={paths.forgotPassword.getHref()} className="font-medium text-rust underline-offset-2 hover:underline">
          Need a new link?
        </Link>
      </p>
    </AuthLayout>
  );
}
