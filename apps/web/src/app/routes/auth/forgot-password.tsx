import { AuthLayout } from "../../../components/layouts/auth-layout.tsx";
import { ForgotPasswordForm } from "../../../features/auth/components/forgot-password-form.tsx";
import { BackToSignIn } from "./sign-in.tsx";

export function ForgotPasswordRoute() {
  return (
    <AuthLayout title="Forgot your password?" intro="Enter the e-mail you sign in with and we will send a link to choose a new password.">
      <ForgotPasswordForm />
      <BackToSignIn />
    </AuthLayout>
  );
}
