import { FieldSheet } from '@/features/plans/components/field-sheet';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function FieldSheetRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Field sheet', name)}</title>
      <FieldSheet key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}
