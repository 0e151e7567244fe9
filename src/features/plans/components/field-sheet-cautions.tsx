import { CautionBox } from '@/components/ui/caution-box';

/** The cautions printed at the foot of every field sheet. */
export function FieldSheetCautions() {
  return (
    <CautionBox title="Cautions for the crew">
      <p>Wear eye protection at the drill; chips and sap fly.</p>
      <p>Bits are sharp: carry them covered and keep your free hand clear of the bit and hammer.</p>
      <p>
        Ice and slopes: mind your footing on frozen ground, hidden roots and steep sidehills, and
        leave a tree when the footing is bad.
      </p>
      <p>Ladders only on firm, level footing, never on ice; leave high holes for another day.</p>
      <p>Work with someone, or tell someone where you are, and carry a phone or a radio.</p>
      <p>
        This sheet is guidance. Follow local codes and rules, and ask qualified people — a licensed
        forester, your certifier — where in doubt.
      </p>
    </CautionBox>
  );
}
