import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import type { RoundTree } from '../api/get-round';

/** A tag typed in, found among the round's living trees, or a plain message why not. */
export function TagPickForm({
  trees,
  name,
  label,
  action,
  onPick,
}: {
  trees: readonly RoundTree[];
  /** The form's accessible name. */
  name: string;
  label: string;
  action: string;
  onPick: (tree: RoundTree) => void;
}) {
  const [tag, setTag] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  return (
    <form
      aria-label={name}
      className="flex flex-col gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        const wanted = tag.trim().toLowerCase();
        const tree = trees.find((t) => t.tag.toLowerCase() === wanted);
        if (!tree) {
          setMessage(
            wanted ? `No living tree tagged ${tag.trim()} in this stand.` : 'Enter a tag.',
          );
          return;
        }
        setMessage(null);
        setTag('');
        onPick(tree);
      }}
    >
      <div className="flex items-end gap-2">
        <label className="flex min-w-0 flex-1 flex-col gap-1">
          <span className="text-sm font-bold">{label}</span>
          <input
            value={tag}
            onChange={(e) => setTag(e.target.value)}
            autoComplete="off"
            className={controlClass}
          />
        </label>
        <Button type="submit" field>
          {action}
        </Button>
      </div>
      {message && (
        <p role="alert" className="text-alert">
          {message}
        </p>
      )}
    </form>
  );
}
