import { CautionBox } from '@/components/ui/caution-box';

/** The cautions that go with any advice on work in the woods, and the limits of a guideline. */
export function ReportCautions() {
  return (
    <CautionBox title="Cautions">
      <p>Drills and hammers work close to eyes and hands: wear eye protection and gloves.</p>
      <p>Ladders and ice do not mix: keep both feet on firm footing.</p>
      <p>Chainsaw work only with training and protective gear.</p>
      <p>Never work alone in the woods; carry a phone or a radio.</p>
      <p>Evaporators are hot and steam burns.</p>
      <p>
        The guidelines here are advice. Local regulations (Quebec’s tapping rules, for one, are
        law), organic certifiers’ rules and licensed foresters take precedence.
      </p>
    </CautionBox>
  );
}
