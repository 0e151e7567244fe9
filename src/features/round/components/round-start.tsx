import { Button } from '@/components/ui/button';
import { useGeolocation } from '@/lib/use-geolocation';
import type { RoundTree } from '../api/get-round';
import type { RoundStart } from '../lib/round-route';
import { TagPickForm } from './tag-pick-form';

/** Where the route begins: a tree chosen by tag, or where the forester stands (optional). */
export function RoundStartPicker({
  trees,
  onStart,
}: {
  trees: readonly RoundTree[];
  onStart: (start: RoundStart) => void;
}) {
  const geo = useGeolocation('Start from a tag instead.');

  const fromHere = async () => {
    const at = await geo.locate();
    if (at) onStart({ at: { lat: at.lat, lng: at.lng } });
  };

  return (
    <div className="flex flex-col gap-3">
      <TagPickForm
        trees={trees}
        name="Start from a tree"
        label="Start at tag"
        action="Start here"
        onPick={(tree) => onStart({ treeId: tree.id })}
      />
      <Button onClick={() => void fromHere()} disabled={geo.status === 'locating'} field>
        {geo.status === 'locating' ? 'Finding where you are…' : 'Start from where I stand'}
      </Button>
      {geo.status === 'failed' && (
        <p role="alert" className="text-alert">
          {geo.message}
        </p>
      )}
    </div>
  );
}
