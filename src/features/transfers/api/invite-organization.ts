import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { OrganizationInvitationInput } from "@shared/schemas/account";
import { api } from "@/lib/api-client";
import { directoryKeys } from "./directory";

/** POST /api/organizations/invitations: the pending organisation can be the receiver at once (issue 14, §3). */
export function useInviteOrganization() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganizationInvitationInput) =>
      api<{ organization: { id: string; name: string; pending: true } }>("/api/organizations/invitations", {
        method: "POST",
        body: input,
      }).then((r) => r.organization),
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: directoryKeys.organizations }),
        client.invalidateQueries({ queryKey: directoryKeys.courierServices }),
        client.invalidateQueries({ queryKey: directoryKeys.couriers }),
      ]),
  });
}
