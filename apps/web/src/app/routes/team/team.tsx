import { useState } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStaff } from "../../../features/staff/api/get-staff.ts";
import { InviteStaffDialog } from "../../../features/staff/components/invite-staff-dialog.tsx";
import { PendingInvitations } from "../../../features/staff/components/pending-invitations.tsx";
import { StaffTable } from "../../../features/staff/components/staff-table.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function TeamRoute() {
  const me = useSignedInUser();
  const staff = useStaff();
  const studio = useStudio();
  const [inviting, setInviting] = useState(false);
  const timeZone = studio.data?.timeZone;

  return (
    <>
      <PageHeader
        title="Team"
        description="Everyone who works at the studio, and what each of them may do in Takeup."
        actions={<Button onClick={() => setInviting(true)}>Invite someone</Button>}
      />
      {staff.isPending ? (
        <LoadingState />
      ) : staff.isError ? (
        <ErrorState error={staff.error} onRetry={() => void staff.refetch()} />
      ) : (
        <>
          <StaffTable members={staff.data.members} currentUserId={me.id} timeZone={timeZone} />
          <PendingInvitations invitations={staff.data.invitations} timeZone={timeZone} />
        </>
      )}
      <InviteStaffDialog open={inviting} onClose={() => setInviting(false)} />
    </>
  );
}
