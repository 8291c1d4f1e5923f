import { useState } from "react";
import { useNavigate } from "react-router";
import { reelStatuses, reelStatusLabels, type ReelStatus } from "@takeup/domain";
import { FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useReels } from "../../../features/vault/api/reels.ts";
import { ReelsTable } from "../../../features/vault/components/reels-table.tsx";
import { ScanBox } from "../../../features/vault/components/scan-box.tsx";
import { useDebouncedValue } from "../../../lib/use-debounced-value.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

/** The vault for staff; "Your reels" for a client (the API narrows the list to its own). */
export function VaultRoute() {
  const me = useSignedInUser();
  const navigate = useNavigate();
  const isClient = me.role === "client";
  const [status, setStatus] = useState<ReelStatus | "">("");
  const [search, setSearch] = useState("");
  const q = useDebouncedValue(search, 250);
  const reels = useReels({ status: status || undefined, q: q.trim() || undefined });
  const canScan = me.role === "owner" || me.role === "manager" || me.role === "engineer";

  return (
    <>
      <PageHeader
        title={isClient ? "Your reels" : "Vault"}
        description={isClient ? "The reels the studio keeps for you, where each one is and what is on it." : "Every reel the studio keeps or sold: its label, shelf and where it is now."}
      />
      {canScan ? (
        <div className="mb-5">
          <ScanBox onFound={(id) => navigate(paths.vault.reel.getHref(id))} />
        </div>
      ) : null}
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <FormField label="Where">
          {(control) => (
            <Select {...control} value={status} onChange={(e) => setStatus(e.target.value as ReelStatus | "")}>
              <option value="">Anywhere</option>
              {reelStatuses.map((s) => (
                <option key={s} value={s}>
                  {reelStatusLabels[s]}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Search" className="min-w-64">
          {(control) => <Input {...control} type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="Label, shelf, project, contents" />}
        </FormField>
      </div>
      {reels.isPending ? (
        <LoadingState />
      ) : reels.isError ? (
        <ErrorState error={reels.error} onRetry={() => void reels.refetch()} />
      ) : (
        <ReelsTable reels={reels.data} reelHref={paths.vault.reel.getHref} showClient={!isClient} />
      )}
    </>
  );
}
