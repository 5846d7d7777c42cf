import { useCallback, useEffect, useRef, useState } from "react";
import { useBlocker, useNavigate, useSearchParams } from "react-router";
import { useQueryClient } from "@tanstack/react-query";
import type { Address } from "@shared/schemas/common";
import type { DirectoryOrganizationDto, TaxonBriefDto, TransferDto, TransferInput } from "@shared/schemas/transfer";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useToast } from "@/components/ui/toast";
import { paths } from "@/config/paths";
import { storeTransfer } from "@/lib/transfer-queries";
import { createTransfer } from "../api/create-transfer";
import { updateTransfer } from "../api/update-transfer";
import { draftPayload, savedIds } from "./transfer-form/draft-payload";
import { clearBrowserDraft, writeBrowserDraft, type BrowserDraft } from "./transfer-form/draft-storage";
import { blankTransfer } from "./transfer-form/form-values";
import { TransferForm, type TransferFormApi, type TransferFormProgress } from "./transfer-form/transfer-form";

type ServerDraft = NonNullable<BrowserDraft["serverDraft"]>;

const snapshot = (values: TransferInput) => JSON.stringify(values, (_k, v: unknown) => (Number.isNaN(v) ? "NaN" : v));

type Props = {
  userId: string;
  organizations: DirectoryOrganizationDto[];
  senderOrganizationId: string | null;
  /** Where a fresh transfer leaves from: the sender's address, when the directory knows it. */
  senderAddress: Address | null;
  /** What this browser kept, to resume from; null for a fresh form. */
  restored: BrowserDraft | null;
  /** Animal lines chosen in the register (issue 15 §2), for a fresh form. */
  prefill?: {
    animals: Omit<TransferInput["animals"][number], "containerKey">[];
    taxa: Record<string, TaxonBriefDto>;
  } | null;
};

/**
 * The new-transfer form that keeps its work: a copy in this browser from the first keystroke
 * (reload, Back, a closed tab), a draft on the server from the moment the route and parties are
 * chosen (each step then saves what is complete), the step in the address (the browser's Back
 * goes one step back), and a question before leaving for another page with work not on the server.
 */
export function NewTransferForm({
  userId,
  organizations,
  senderOrganizationId,
  senderAddress,
  restored,
  prefill,
}: Props) {
  const client = useQueryClient();
  const navigate = useNavigate();
  const notify = useToast();
  const [params, setParams] = useSearchParams();
  // One blank per form (its first box gets a random key): "nothing typed" means equal to it.
  const [blank] = useState(() => blankTransfer(senderAddress));
  const serverDraft = useRef<ServerDraft | null>(restored?.serverDraft ?? null);
  const savedSnapshot = useRef(restored?.savedSnapshot ?? snapshot(blank));
  const [unsaved, setUnsaved] = useState(restored ? snapshot(restored.values) !== savedSnapshot.current : false);
  const [keptHere, setKeptHere] = useState(true);
  const leaving = useRef(false);

  const shown = Number(params.get("step") ?? "1") - 1;
  const step = Number.isInteger(shown) ? shown : 0;
  const showStep = useCallback(
    (next: number, replace: boolean) =>
      setParams(
        (p) => {
          const copy = new URLSearchParams(p);
          if (next === 0) copy.delete("step");
          else copy.set("step", String(next + 1));
          return copy;
        },
        { replace },
      ),
    [setParams],
  );
  // A restored copy resumes at its step; the address then says so.
  useEffect(() => {
    if (restored && restored.step > 0 && !params.has("step")) showStep(restored.step, true);
    // Only on arrival: afterwards the address leads.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  const keep = useCallback(
    ({ values, step: at, taxa }: TransferFormProgress) => {
      const now = snapshot(values);
      setUnsaved(now !== savedSnapshot.current);
      if (!serverDraft.current && now === snapshot(blank)) return clearBrowserDraft(userId);
      const draft = { step: at, values, taxa, serverDraft: serverDraft.current, savedSnapshot: savedSnapshot.current };
      setKeptHere(writeBrowserDraft(userId, draft));
    },
    [blank, userId],
  );

  /** Keeps on the server what is complete so far; the first time, that creates the draft. */
  async function saveProgress(values: TransferInput, _step: number, form: TransferFormApi) {
    const { route, lists } = draftPayload(values);
    const current = serverDraft.current;
    const saved: TransferDto = current
      ? await updateTransfer(current.id, {
          version: current.version,
          ...route,
          ...(lists ? { containers: lists.containers, animals: lists.animals } : {}),
        })
      : await createTransfer({ ...route, containers: lists?.containers ?? [], animals: lists?.animals ?? [] });
    serverDraft.current = { id: saved.id, number: saved.number, version: saved.version };
    storeTransfer(client, saved);
    if (lists) {
      const ids = savedIds(saved, lists, values);
      ids.containers.forEach((id, i) => form.setValue(`containers.${i}.id`, id));
      ids.animals.forEach((id, i) => form.setValue(`animals.${i}.id`, id));
    }
    savedSnapshot.current = snapshot(form.getValues());
    setUnsaved(false);
    if (!current)
      notify(`Draft ${saved.number} saved`, "It is in your transfers list. Nothing is sent to the receiver yet.");
  }

  async function saveAll(values: TransferInput) {
    const current = serverDraft.current;
    const saved = current
      ? await updateTransfer(current.id, { version: current.version, ...values })
      : await createTransfer(values);
    storeTransfer(client, saved);
    leaving.current = true;
    clearBrowserDraft(userId);
    notify(`Draft ${saved.number} saved`, "Send it to the receiver from its page when you are ready.");
    navigate(paths.transfers.detail.href(saved.id));
  }

  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      unsaved &&
      !leaving.current &&
      currentLocation.pathname !== nextLocation.pathname &&
      nextLocation.pathname !== paths.signIn, // signing out: the kept copy goes with the person
  );
  useEffect(() => {
    // Leaving the site or reloading loses nothing while this browser keeps the copy; when it
    // cannot (storage full or switched off), the browser asks first, in its own words.
    if (!unsaved || keptHere) return;
    const ask = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      event.returnValue = "";
    };
    window.addEventListener("beforeunload", ask);
    return () => window.removeEventListener("beforeunload", ask);
  }, [unsaved, keptHere]);

  return (
    <>
      <TransferForm
        mode="create"
        defaultValues={
          restored?.values ??
          (prefill?.animals.length
            ? {
                ...blank,
                animals: prefill.animals.map((line) => ({ ...line, containerKey: blank.containers[0]?.key ?? null })),
              }
            : blank)
        }
        initialTaxa={restored?.taxa ?? prefill?.taxa ?? {}}
        step={step}
        onStepChange={(next) => showStep(next, next < step)}
        organizations={organizations}
        senderOrganizationId={senderOrganizationId}
        submitLabel="Save the draft"
        onStepDone={saveProgress}
        onProgress={keep}
        onSave={(values) => saveAll(values as TransferInput)}
      />
      <ConfirmDialog
        open={blocker.state === "blocked"}
        title="Leave the new transfer?"
        confirmLabel="Leave"
        cancelLabel="Stay on the form"
        onConfirm={() => {
          // Once the person chose to leave, this form never stops a navigation again (not even
          // the Back that may come before React has taken this page down).
          leaving.current = true;
          blocker.proceed?.();
        }}
        onCancel={() => blocker.reset?.()}
      >
        <p>
          {serverDraft.current
            ? `The draft ${serverDraft.current.number} is saved up to the last step you finished. What you changed since is not on Hatchway yet.`
            : "Nothing is saved on Hatchway yet: the draft is saved once the route and parties are chosen and you go on to the boxes."}
        </p>
        <p>
          {keptHere
            ? "This browser keeps what you typed until you sign out: open New transfer again to pick it up."
            : "This browser could not keep a copy, so what is not on Hatchway is lost if you leave."}
        </p>
      </ConfirmDialog>
    </>
  );
}
