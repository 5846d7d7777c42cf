import { queryOptions, useQuery } from "@tanstack/react-query";
import type {
  DirectoryCourierDto,
  DirectoryCourierServiceDto,
  DirectoryOrganizationDto,
} from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";

export const directoryKeys = {
  organizations: ["directory", "organizations"] as const,
  couriers: ["directory", "couriers"] as const,
  courierServices: ["directory", "courier-services"] as const,
};

export const directoryOrganizationsQueryOptions = () =>
  queryOptions({
    queryKey: directoryKeys.organizations,
    queryFn: ({ signal }) =>
      api<{ organizations: DirectoryOrganizationDto[] }>("/api/directory/organizations", { signal }).then(
        (r) => r.organizations,
      ),
    staleTime: 5 * 60_000,
  });

export const useDirectoryOrganizations = () => useQuery(directoryOrganizationsQueryOptions());

export const directoryCouriersQueryOptions = () =>
  queryOptions({
    queryKey: directoryKeys.couriers,
    queryFn: ({ signal }) =>
      api<{ couriers: DirectoryCourierDto[] }>("/api/directory/couriers", { signal }).then((r) => r.couriers),
    staleTime: 5 * 60_000,
  });

export const useDirectoryCouriers = (enabled = true) => useQuery({ ...directoryCouriersQueryOptions(), enabled });

/** Courier services the sender can ask to carry a transfer: listed, invited, or already carrying one. */
export const useDirectoryCourierServices = (enabled = true) =>
  useQuery({
    queryKey: directoryKeys.courierServices,
    queryFn: ({ signal }) =>
      api<{ courierServices: DirectoryCourierServiceDto[] }>("/api/directory/courier-services", { signal }).then(
        (r) => r.courierServices,
      ),
    staleTime: 5 * 60_000,
    enabled,
  });
