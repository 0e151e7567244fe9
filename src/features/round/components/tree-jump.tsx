import type { RoundTree } from '../api/get-round';
import { TagPickForm } from './tag-pick-form';

/** Quick entry by tag: measure a tree out of the route's order. */
export function TreeJump({
  trees,
  onChoose,
}: {
  trees: readonly RoundTree[];
  onChoose: (tree: RoundTree) => void;
}) {
  return (
    <TagPickForm
      trees={trees}
      name="Measure a tree by tag"
      label="Measure by tag"
      action="Go"
      onPick={onChoose}
    />
  );
}
