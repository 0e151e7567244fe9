import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import type { RoundTree } from '../api/get-round';
import type { RoundStart } from '../lib/round-route';

/** Where the route begins: a tree chosen by tag, or where the forester stands (optional). */
export function RoundStartPicker({
  trees,
  onStart,
}: {
  trees: readonly RoundTree[];
  onStart: (start: RoundStart) => void;
}) {
  const [tag, setTag] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const [locating, setLocating] = useState(false);

  const fromTag = (e: React.FormEvent) => {
    e.preventDefault();
    const wanted = tag.trim().toLowerCase();
    const tree = trees.find((t) => t.tag.toLowerCase() === wanted);
    if (!tree)
      setMessage(wanted ? `No living tree tagged ${tag.trim()} in this stand.` : 'Enter a tag.');
    else {
      setMessage(null);
      onStart({ treeId: tree.id });
    }
  };

  const fromHere = () => {
    if (!('geolocation' in navigator)) {
      setMessage('This device cannot tell where it is: start from a tag instead.');
      return;
    }
    setLocating(true);
    navigator.geolocation.getCurrentPosition(
      (pos) => {
        setLocating(false);
        setMessage(null);
        onStart({ at: { lat: pos.coords.latitude, lng: pos.coords.longitude } });
      },
      () => {
        setLocating(false);
        setMessage('No position from this device: start from a tag instead.');
      },
      { enableHighAccuracy: true, timeout: 15_000, maximumAge: 60_000 },
    );
  };

  return (
    <div className="flex flex-col gap-3">
      <form onSubmit={fromTag} className="flex items-end gap-2" aria-label="Start from a tree">
        <label className="flex min-w-0 flex-1 flex-col gap-1">
          <span className="text-sm font-bold">Start at tag</span>
          <input
            value={tag}
            onChange={(e) => setTag(e.target.value)}
            autoComplete="off"
            className={controlClass}
          />
        </label>
        <Button type="submit" field>
          Start here
        </Button>
      </form>
      <Button onClick={fromHere} disabled={locating} field>
        {locating ? 'Finding where you are…' : 'Start from where I stand'}
      </Button>
      {message && (
        <p role="alert" className="text-alert">
          {message}
        </p>
      )}
    </div>
  );
}
