import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { useMoveTree } from '../api/move-tree';
import type { LatLng } from './move-marker';

interface Moving {
  treeId: number;
  start: LatLng;
  dropped: LatLng | null;
}

/** Moving one tree: start where it stands, drop somewhere new, then save or put it back. */
export function useTreeMove(sugarbushId: number) {
  const mutation = useMoveTree(sugarbushId);
  const [moving, setMoving] = useState<Moving | null>(null);
  const [error, setError] = useState<string | undefined>();

  const start = (treeId: number, at: LatLng) => {
    setError(undefined);
    setMoving({ treeId, start: at, dropped: null });
  };
  const cancel = () => {
    setError(undefined);
    setMoving(null);
  };
  const drop = (at: LatLng) => setMoving((m) => m && { ...m, dropped: at });
  const save = () => {
    if (!moving?.dropped) return;
    mutation.mutate(
      { treeId: moving.treeId, ...moving.dropped },
      {
        onSuccess: () => setMoving(null),
        onError: (e) =>
          setError(isApiError(e) ? e.message : 'The new position was not saved. Try again.'),
      },
    );
  };

  return {
    moving,
    state: moving && { dropped: moving.dropped !== null, saving: mutation.isPending, error },
    start,
    cancel,
    drop,
    save,
  };
}
