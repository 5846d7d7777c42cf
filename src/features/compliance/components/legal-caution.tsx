import { Notice } from "@/components/ui/feedback";

/** Shown wherever a verdict is (PRODUCT.md: rules summaries are not legal advice). */
export function LegalCaution() {
  return (
    <Notice tone="caution" title="Not legal advice">
      This summary is a planning aid built from the rule library, not legal advice. Rules change: before the animals
      travel, confirm the requirements with the state wildlife agency of each state on the route and with a licensed
      veterinarian.
    </Notice>
  );
}
