import { Link, useSearchParams } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useJoinOrganization } from "../api/account";

/** Accepting an invitation to join an organisation with the account one already has (issue 14, §5). */
export function JoinRoute() {
  const [params] = useSearchParams();
  const join = useJoinOrganization();
  return (
    <div className="max-w-xl">
      <PageHeader title="Join an organisation" />
      {join.isSuccess ? (
        <Notice tone="ok" title={`You joined ${join.data.organization.name}`}>
          <Link className="font-semibold underline" to={paths.home}>
            Open your transfers
          </Link>
        </Notice>
      ) : (
        <div className="flex flex-col gap-4">
          <p>Accepting moves your account to the organisation that invited you. Nothing changes until you accept.</p>
          {join.error ? (
            <Notice tone="block" role="alert">
              {join.error instanceof ApiError ? join.error.message : "That did not work. Try again."}
            </Notice>
          ) : null}
          <Button busy={join.isPending} onClick={() => join.mutate(params.get("token") ?? "")}>
            Accept and join
          </Button>
        </div>
      )}
    </div>
  );
}
