import { useSugarbush } from './get-sugarbush';
import { useTapholes } from './get-tapholes';
import { useTreeAdvice } from './get-tree-advice';
import { spacingRulesFor } from './spacing-check';
import { readTrunkHoles } from './trunk-holes';

/**
 * What a tree's trunk diagram and a drilled-hole check read, when the tree is opened: its advice
 * for the season (spots, drill, growth), every hole on record, and the stand's guideline rules.
 */
export function useTreeDrilling(treeId: number, sugarbushId: number | undefined, season: number) {
  const advice = useTreeAdvice(treeId, season);
  const tapholes = useTapholes(treeId);
  const stand = useSugarbush(sugarbushId);
  const a = advice.data;
  const holes = tapholes.data?.items;
  const rules =
    a && (a.profile.key !== 'custom' || stand.data)
      ? spacingRulesFor(a.profile.key, stand.data?.customProfile)
      : null;
  const marks =
    a && holes && rules
      ? readTrunkHoles(holes, a.placements, {
          season,
          depthCm: a.depthCm,
          radialGrowthCmPerYear: a.radialGrowthCmPerYear,
          zone: rules.zone,
          bitCm: a.bitCm,
        })
      : null;
  const seasonHoles = (holes ?? []).filter((h) => h.season === season);
  return {
    advice,
    tapholes,
    rules,
    marks,
    seasonHoles,
    isPending:
      advice.isPending || tapholes.isPending || (a?.profile.key === 'custom' && stand.isPending),
    // A custom guideline that no longer reads is an error too, not a diagram without rules.
    isError:
      advice.isError ||
      tapholes.isError ||
      stand.isError ||
      (Boolean(a) && !rules && !stand.isPending),
    refetch: () => Promise.all([advice.refetch(), tapholes.refetch(), stand.refetch()]),
  };
}
