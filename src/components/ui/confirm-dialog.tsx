import { useEffect, useId, useRef, type FormEvent, type ReactNode } from "react";
import { createPortal } from "react-dom";
import { Button } from "./button";

type Props = {
  open: boolean;
  /** The question, e.g. "Send HW-26-4K7QP to Willow Marsh Nature Centre?" */
  title: string;
  /** What will happen, in plain words; fields (e.g. a reason) may sit here too. */
  children: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  tone?: "primary" | "danger";
  busy?: boolean;
  /** Called on the confirm button (or Enter in a field); validate here and keep the dialog open if needed. */
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * Asks before an important or irreversible step: the browser's own modal <dialog>, which keeps
 * keyboard focus inside, closes on Escape and hides the page behind it from screen readers.
 * Focus starts on the safe choice for a dangerous step, on the step itself otherwise.
 * Rendered into <body>, so a page form around it stays valid HTML.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = "Not now",
  tone = "primary",
  busy = false,
  onConfirm,
  onCancel,
}: Props) {
  const dialog = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useEffect(() => {
    const element = dialog.current;
    if (!element) return;
    if (open && !element.open) {
      if (typeof element.showModal === "function") element.showModal();
      else element.setAttribute("open", ""); // test DOMs without <dialog> support
    } else if (!open && element.open) {
      if (typeof element.close === "function") element.close();
      else element.removeAttribute("open");
    }
  }, [open]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!busy) onConfirm();
  };

  // In <body>, so the dialog's own form is never inside the page's form.
  return createPortal(
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      aria-describedby={bodyId}
      onCancel={(event) => {
        event.preventDefault(); // Escape: the parent decides, so its state stays the truth
        if (!busy) onCancel();
      }}
      className="m-auto w-[calc(100%-2rem)] max-w-lg rounded-card border border-rule bg-paper-card p-0 text-ink shadow-card backdrop:bg-ink/40"
    >
      {open ? (
        <form onSubmit={submit} className="grid gap-4 p-5" noValidate>
          <h2 id={titleId} className="text-xl font-semibold">
            {title}
          </h2>
          <div id={bodyId} className="grid gap-3 text-base leading-relaxed">
            {children}
          </div>
          <div className="flex flex-wrap justify-end gap-2 border-t border-rule pt-4">
            <Button type="button" variant="secondary" onClick={onCancel} disabled={busy} autoFocus={tone === "danger"}>
              {cancelLabel}
            </Button>
            <Button type="submit" variant={tone} busy={busy} autoFocus={tone !== "danger"}>
              {confirmLabel}
            </Button>
          </div>
        </form>
      ) : null}
    </dialog>,
    document.body,
  );
}
