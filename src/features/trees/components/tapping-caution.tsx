import { CautionBox } from '@/components/ui/caution-box';

export function TappingCaution() {
  return (
    <CautionBox title="Before you drill or climb">
      <p>Wear eye protection at the drill and keep your free hand clear of the bit and hammer.</p>
      <p>
        Snow hides roots and ice. Set a ladder only on firm footing, and leave high holes for a day
        without ice.
      </p>
      <p>Work with someone, or tell someone where you are, and carry a phone or radio.</p>
      <p>
        Clearwood gives guidance. Local regulations, your certifier and a licensed forester come
        first.
      </p>
    </CautionBox>
  );
}
