import { Link, useNavigate, useParams } from "react-router";
import { AuthLayout } from "../../../components/layouts/auth-layout.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useInvitation } from "../../../features/auth/api/get-invitation.ts";
import { AcceptInvitationForm } from "../../../features/auth/components/accept-invitation-form.tsx";
import { InvitationSummary } from "../../../features/auth/components/invitation-summary.tsx";
import { ApiError } from "../../../lib/api-client.ts";

// 404 is an expired or used link; 400 is a link that was cut short when copied.
const isDeadLink = (error: unknown) => error instanceof ApiError && (error.status === 404 || error.status === 400);

export function AcceptInvitationRoute() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitation(token);

  if (invitation.isPending) {
    return (
      <AuthLayout title="Your invitation">
        <LoadingState label="Opening your invitation…" />
      </AuthLayout>
    );
  }
  if (invitation.isError) {
    if (isDeadLink(invitation.error)) {
      return (
        <AuthLayout
          title="This invitation has expired"
          intro="The link is too old or was already used. Ask the person who invited you to send a new one."
        >
          <p className="text-center text-sm">
            <Link to={paths.signIn.getHref()} className="font-medium text-rust underline-offset-2 hover:underline">
              Already accepted? Sign in
            </Link>
          </p>
        </AuthLayout>
      );
    }
    return (
      <AuthLayout title="Your invitation">
        <ErrorState error={invitation.error} onRetry={() => void invitation.refetch()} />
      </AuthLayout>
    );
  }

  const { data } = invitation;
  return (
    <AuthLayout title={`Join ${data.studioName}`}>
      <InvitationSummary invitation={data} />
      <div className="mt-5">
        <AcceptInvitationForm token={token} email={data.email} onAccepted={() => navigate(paths.home.getHref(), { replace: true })} />
      </div>
    </AuthLayout>
  );
}
