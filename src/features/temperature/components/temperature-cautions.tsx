import { Notice } from "@/components/ui/feedback";

/** The cautions that go with every temperature verdict (PRODUCT.md), in plain words. */
export function TemperatureCautions() {
  return (
    <Notice tone="caution" title="A planning aid, not a guarantee">
      <ul className="list-disc space-y-1 pl-5">
        <li>
          The forecast and the box model can be wrong: check the weather at both ends yourselves before the box leaves.
        </li>
        <li>Heat packs never touch an animal&rsquo;s container: fix them to the lid or a wall, with paper between.</li>
        <li>
          Never leave animals in a parked vehicle: a closed car in the sun gains about 40 °F in an hour, even on a mild
          day.
        </li>
        <li>Follow the carrier&rsquo;s rules for live animals and the rules of every state on the way.</li>
        <li>The bands are guidelines (REPTILES magazine&rsquo;s shipping guide), not law; administrators keep them.</li>
      </ul>
    </Notice>
  );
}
