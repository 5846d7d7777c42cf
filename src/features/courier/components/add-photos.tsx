import { useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import type { TransferDto } from "@shared/schemas/transfer";
import { HANDOFF_KIND_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { PhotoPicker } from "@/components/ui/photo-picker";
import { uploadPhotos, type ChosenPhoto } from "@/lib/photos";
import { storeTransfer } from "@/lib/transfer-queries";

/** Photos added to a handoff already recorded (one that did not go through, or one taken later). */
export function AddPhotos({ transfer: t }: { transfer: TransferDto }) {
  const client = useQueryClient();
  const last = [...t.handoffs].sort((a, b) => b.handoffIndex - a.handoffIndex)[0];
  const [photos, setPhotos] = useState<ChosenPhoto[]>([]);
  const [state, setState] = useState<{ busy: boolean; failed: string[]; sent: number }>({
    busy: false,
    failed: [],
    sent: 0,
  });
  if (!last) return null;

  async function send() {
    setState({ busy: true, failed: [], sent: 0 });
    const result = await uploadPhotos(t.id, { moment: "handoff", handoffIndex: last!.handoffIndex }, photos);
    if (result.transfer) storeTransfer(client, result.transfer);
    setPhotos(result.failed.map((f) => f.photo));
    setState({ busy: false, failed: result.failed.map((f) => f.message), sent: photos.length - result.failed.length });
  }

  return (
    <section aria-labelledby="add-photos-title" className="grid gap-3">
      <h2 id="add-photos-title" className="text-xl font-semibold">
        Add photos to “{HANDOFF_KIND_WORDS[last.kind]}”
      </h2>
      <PhotoPicker
        slots={[
          { subject: "box_outside", label: "Photo of the boxes" },
          { subject: "seal", label: "Photo of a seal" },
          { subject: "animal", label: "Photo of an animal" },
        ]}
        value={photos}
        onChange={(next) => {
          setPhotos(next);
          setState((s) => ({ ...s, failed: [], sent: 0 }));
        }}
      />
      {state.failed.length ? (
        <Notice tone="block" role="alert" title="Not every photo was sent">
          {state.failed.join(" ")} The ones left above can be sent again.
        </Notice>
      ) : state.sent ? (
        <Notice tone="ok" role="status">
          {state.sent === 1 ? "The photo is" : `${state.sent} photos are`} on the record.
        </Notice>
      ) : null}
      {photos.length ? (
        <div>
          <Button type="button" size="lg" busy={state.busy} onClick={() => void send()}>
            Send {photos.length === 1 ? "the photo" : `${photos.length} photos`}
          </Button>
        </div>
      ) : null}
    </section>
  );
}
