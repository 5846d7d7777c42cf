import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { SelectField } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import { ApiError } from "@/lib/api-client";
import { useChooseCourierService } from "../api/choose-courier-service";
import { useDirectoryCourierServices } from "../api/directory";
import { InviteOrganization } from "./invite-organization";

/** The courier service asked to carry the transfer, as every party reads it. */
function ChosenService({ service }: { service: NonNullable<TransferDto["courierService"]> }) {
  return (
    <p>
      <span className="font-semibold">{service.name}</span>
      {service.city ? `, ${service.city}, ${service.state}` : `, ${service.state}`}
      {service.pending ? (
        <span className="text-ink-soft"> · invited by e-mail, nobody of it has joined Hatchway yet</span>
      ) : service.phone ? (
        <>
          {" · "}
          <a className="text-fern underline" href={`tel:${service.phone}`}>
            {service.phone}
          </a>
        </>
      ) : null}
    </p>
  );
}

/**
 * The sender asks a courier service to carry the transfer: one listed in the directory, or one it
 * invites by e-mail (issue 14, §3). The service's manager then puts its couriers on the legs.
 */
function ChooseServiceForm({ transfer, onDone }: { transfer: TransferDto; onDone: () => void }) {
  const services = useDirectoryCourierServices();
  const choose = useChooseCourierService(transfer.id);
  const notify = useToast();
  const [picked, setPicked] = useState(transfer.courierService?.id ?? "");
  const save = (organizationId: string | null) =>
    choose.mutate(organizationId, {
      onSuccess: (t) => {
        notify(
          t.courierService ? `Asked ${t.courierService.name} to carry it` : "No courier service is asked now",
          t.courierService ? "Its manager puts its couriers on the legs; each courier is told by e-mail." : undefined,
        );
        onDone();
      },
    });

  if (services.isPending) return <Loading label="Loading courier services…" />;
  if (services.error)
    return (
      <Notice tone="block" role="alert">
        {(services.error as Error).message}
      </Notice>
    );
  const options = [
    { value: "", label: services.data.length ? "Choose a courier service…" : "No courier service is listed yet" },
    ...services.data.map((s) => ({
      value: s.id,
      label: `${s.name} (${s.city ? `${s.city}, ` : ""}${s.state})${s.pending ? " · invited, not joined yet" : ""}`,
    })),
  ];
  return (
    <div className="grid gap-3">
      {choose.error ? (
        <Notice tone="block" role="alert">
          {choose.error instanceof ApiError ? choose.error.message : "Not saved. Try again."}
        </Notice>
      ) : null}
      <form
        noValidate
        className="flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (picked) save(picked);
        }}
      >
        <div className="min-w-0 grow sm:max-w-md">
          <SelectField
            label="Services you can ask"
            options={options}
            value={picked}
            onChange={(e) => setPicked(e.target.value)}
          />
        </div>
        <Button type="submit" busy={choose.isPending} disabled={!picked}>
          Ask them to carry it
        </Button>
        {transfer.courierService ? (
          <Button type="button" variant="ghost" onClick={() => save(null)}>
            Take the request back
          </Button>
        ) : null}
        <Button type="button" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </form>
      <InviteOrganization
        party="courier_service"
        defaultState={transfer.origin.state}
        onInvited={(organizationId) => save(organizationId)}
      />
    </div>
  );
}

/** Which courier service carries the transfer; the sender chooses it while the transfer can change. */
export function CourierServiceChoice({ transfer: t }: { transfer: TransferDto }) {
  const [editing, setEditing] = useState(false);
  const senderMayChoose = t.viewerRole === "sender" && t.abilities.edit;
  const managesService = t.viewerRole === "courier" && t.abilities.assignCouriers;
  return (
    <div className="mb-4 grid gap-2 border-b border-rule pb-4">
      <h3 className="font-semibold">Courier service</h3>
      {editing ? (
        <ChooseServiceForm transfer={t} onDone={() => setEditing(false)} />
      ) : (
        <>
          {t.courierService ? (
            <ChosenService service={t.courierService} />
          ) : (
            <p className="text-ink-soft">
              No courier service asked. The sender can ask one, or put couriers on the legs.
            </p>
          )}
          {managesService ? (
            <p className="text-sm">
              Your service was asked to carry this transfer: put your couriers on its legs below.
            </p>
          ) : null}
          {senderMayChoose ? (
            <div>
              <Button variant="secondary" onClick={() => setEditing(true)}>
                {t.courierService ? "Change the courier service" : "Choose a courier service"}
              </Button>
            </div>
          ) : null}
        </>
      )}
    </div>
  );
}
