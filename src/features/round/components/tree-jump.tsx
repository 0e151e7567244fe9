import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import type { RoundTree } from '../api/get-round';

/** Quick entry by tag: measure a tree out of the route's order. */
export function TreeJump({
  trees,
  onChoose,
}: {
  trees: readonly RoundTree[];
  onChoose: (tree: RoundTree) => void;
}) {
  const [tag, setTag] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  return (
    <form
      aria-label="Measure a tree by tag"
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
        onChoose(tree);
      }}
    >
      <div className="flex items-end gap-2">
        <label className="flex min-w-0 flex-1 flex-col gap-1">
          <span className="text-sm font-bold">Measure by tag</span>
          <input
            value={tag}
            onChange={(e) => setTag(e.target.value)}
            autoComplete="off"
            className={controlClass}
          />
        </label>
        <Button type="submit" field>
          Go
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
