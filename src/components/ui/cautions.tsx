import { Notice } from "./feedback";

/** The cautions that travel with every transfer (PRODUCT.md), in plain words. */
export function TransportCautions() {
  return (
    <Notice tone="caution" title="Before and while the boxes travel">
      <ul className="list-disc space-y-1 pl-5">
        <li>Keep boxes out of direct sun and out of closed cars.</li>
        <li>Heat packs never touch an animal's container.</li>
        <li>
          Hatchway's checks are a planning aid, not legal or veterinary advice — confirm with the state wildlife agency
          and a licensed veterinarian.
        </li>
      </ul>
    </Notice>
  );
}
