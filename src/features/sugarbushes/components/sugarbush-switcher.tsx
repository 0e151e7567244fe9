import { useId } from 'react';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import { Skeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { roleLabels } from '@/lib/auth';
import { useSugarbushes } from '../api/get-sugarbushes';

interface Props {
  currentId: number | undefined;
  onSelect: (id: number) => void;
}

/** The stands the user belongs to, each with the user's role there. */
export function SugarbushSwitcher({ currentId, onSelect }: Props) {
  const sugarbushes = useSugarbushes();
  const id = useId();

  if (sugarbushes.isPending) return <Skeleton className="h-11 w-full" />;
  if (sugarbushes.isError) {
    return (
      <div role="alert" className="text-sm">
        <p>We couldn't load your sugarbushes.</p>
        <Button variant="quiet" className="px-0" onClick={() => void sugarbushes.refetch()}>
          Retry
        </Button>
      </div>
    );
  }

  const items = sugarbushes.data.items;
  if (items.length === 0) {
    return (
      <Link
        to={paths.newSugarbush.href()}
        className="inline-flex min-h-11 items-center underline underline-offset-4 md:min-h-0"
      >
        Start a sugarbush
      </Link>
    );
  }
  const current = items.find((s) => s.id === currentId);
  if (items.length === 1 && current) {
    return (
      <div>
        <p className="font-bold">{current.name}</p>
        <p className="text-sm text-bark">{roleLabels[current.role]}</p>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm text-bark">
        Sugarbush
      </label>
      <select
        id={id}
        value={currentId ?? ''}
        onChange={(e) => onSelect(Number(e.target.value))}
        className={controlClass}
      >
        {currentId === undefined && <option value="">Choose a sugarbush</option>}
        {items.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name} — {roleLabels[s.role]}
          </option>
        ))}
      </select>
    </div>
  );
}
