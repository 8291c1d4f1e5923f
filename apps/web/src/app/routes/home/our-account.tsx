import type { MeDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useClient } from "../../../features/clients/api/get-client.ts";
import { ClientAccount } from "../../../features/clients/components/client-account.tsx";
import { NextSessionCard } from "../../../features/bookings/components/studio-sessions.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { paths } from "../../../config/paths.ts";

export function OurAccountPage({ me }: { me: MeDto }) {
  if (!me.clientAccount) {
    return (
      <>
        <PageHeader title="Our account" />
        <EmptyState title="This sign-in is not linked to a client account.">Ask the studio to check your invitation.</EmptyState>
      </>
    );
  }
  return <OurAccount clientId={me.clientAccount.id} />;
}

function OurAccount({ clientId }: { clientId: number }) {
  const client = useClient(clientId);
  const studio = useStudio();
  if (client.isPending) return <LoadingState />;
  if (client.isError) return <ErrorState error={client.error} onRetry={() => void client.refetch()} />;
  return (
    <>
      <PageHeader
        eyebrow="Our account"
        title={client.data.name}
        description="What the studio has on file for you. To change anything, get in touch with the studio."
      />
      {studio.data ? (
        <div className="mb-5">
          <NextSessionCard timeZone={studio.data.timeZone} sessionsHref={paths.sessions.getHref()} />
        </div>
      ) : null}
      <ClientAccount client={client.data} audience="client" canEdit={false} />
    </>
  );
}
