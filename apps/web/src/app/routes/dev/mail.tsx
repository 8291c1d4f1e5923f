import { Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useCaughtMail } from "../../../features/dev-mail/api/get-caught-mail.ts";
import { CaughtMail } from "../../../features/dev-mail/components/caught-mail.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { ApiError } from "../../../lib/api-client.ts";

export function DevMailRoute() {
  const mail = useCaughtMail();
  const studio = useStudio();
  const catcherOff = mail.error instanceof ApiError && mail.error.code === "mail_catcher_off";

  return (
    <>
      <PageHeader
        title="Caught e-mail"
        description="Messages Takeup sent while running locally, caught before they reach anyone."
        actions={
          catcherOff ? null : (
            <Button variant="secondary" onClick={() => void mail.refetch()} pending={mail.isFetching}>
              Check again
            </Button>
          )
        }
      />
      {catcherOff ? (
        <EmptyState title="E-mail is going to a real mail server; nothing is caught here." />
      ) : mail.isError ? (
        <ErrorState error={mail.error} onRetry={() => void mail.refetch()} />
      ) : mail.isPending ? (
        <LoadingState />
      ) : (
        <CaughtMail messages={mail.data} timeZone={studio.data?.timeZone ?? "UTC"} />
      )}
    </>
  );
}
