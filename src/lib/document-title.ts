import { useEffect } from "react";

/**
 * Names the page in the browser tab and history, and for screen readers after a client-side
 * navigation: "Transfer HW-26-4K7QP · Hatchway". Nothing changes while the name is unknown.
 */
export function useDocumentTitle(title: string | null | undefined): void {
  useEffect(() => {
    if (title) document.title = `${title} · Hatchway`;
  }, [title]);
}
