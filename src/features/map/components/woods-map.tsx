import { ErrorState } from '@/components/ui/error-state';
import { AdviceProgress } from '@/components/advice-progress';
import { Skeleton } from '@/components/ui/skeleton';
import { useSugarbush } from '@/features/sugarbushes/api/get-sugarbush';
import { useMapTrees } from '../api/get-map-trees';
import { MapWorkspace } from './map-workspace';

/** The woods map of one sugarbush: loading, failure, or the map with its tools. */
export function WoodsMap({ sugarbushId }: { sugarbushId: number }) {
  const map = useMapTrees(sugarbushId);
  const sugarbush = useSugarbush(sugarbushId);

  if (map.isPending || sugarbush.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <AdviceProgress sugarbushId={sugarbushId} waiting={map.isPending} />
        <div role="status" aria-label="Loading the map" className="flex flex-col gap-4">
          <Skeleton className="h-11 w-full" />
          <Skeleton className="h-[60vh] w-full" />
        </div>
      </div>
    );
  }
  if (map.isError || sugarbush.isError) {
    const failed = map.isError ? map : sugarbush;
    return (
      <ErrorState
        title="We couldn't load the map."
        error={failed.error}
        onRetry={() => void failed.refetch()}
      />
    );
  }
  return <MapWorkspace sugarbushId={sugarbushId} data={map.data} sugarbush={sugarbush.data} />;
}
