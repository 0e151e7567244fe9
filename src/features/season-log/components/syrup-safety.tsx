import { CautionBox } from '@/components/ui/caution-box';

/** The standing caution beside the syrup figures: boiling is where people get hurt. */
export function SyrupSafety() {
  return (
    <CautionBox title="Boiling safely">
      <p>
        An evaporator runs hot enough to burn at a touch, and its steam scalds. Keep children and
        visitors back from the pans, wear gloves and closed shoes, never leave a fire unattended,
        and keep the sugarhouse ventilated.
      </p>
      <p>
        Fire, fuel, chimney and food-safety rules differ from place to place: local codes, your
        inspector and licensed professionals come first.
      </p>
    </CautionBox>
  );
}
