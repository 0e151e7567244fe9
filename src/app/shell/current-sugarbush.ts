import { useEffect } from 'react';
import { useMatches, useParams } from 'react-router';
import type { SectionKey } from '@/config/paths';
import { useMe } from '@/lib/auth';
import { useTree } from '@/lib/get-tree';
import type { SectionHandle } from './sections';

const STORAGE_KEY = 'clearwood.lastSugarbush';

export function rememberedSugarbushId(): number | undefined {
  try {
    const value = Number(window.sessionStorage.getItem(STORAGE_KEY));
    return Number.isInteger(value) && value > 0 ? value : undefined;
  } catch {
    return undefined;
  }
}

function remember(id: number) {
  try {
    window.sessionStorage.setItem(STORAGE_KEY, String(id));
  } catch {
    // Storage unavailable: the first sugarbush is the fallback.
  }
}

const toId = (value: string | undefined) => {
  const n = Number(value);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

/**
 * The sugarbush the user is working in: from the URL, from the tree being viewed, or the
 * last one used in this tab, else the first membership.
 */
export function useCurrentSugarbushId(): number | undefined {
  const params = useParams();
  const { data: me } = useMe();
  const fromUrl = toId(params.id);
  const tree = useTree(fromUrl === undefined ? toId(params.treeId) : undefined);
  const memberOf = (id: number | undefined) =>
    id !== undefined && me?.memberships.some((m) => m.sugarbushId === id) ? id : undefined;
  const id =
    fromUrl ??
    tree.data?.sugarbushId ??
    memberOf(rememberedSugarbushId()) ??
    me?.memberships[0]?.sugarbushId;

  const isMember = memberOf(id) !== undefined;
  useEffect(() => {
    if (id !== undefined && isMember) remember(id);
  }, [id, isMember]);
  return id;
}

/** The section the current page belongs to, from its route handle. */
export function useCurrentSection(): SectionKey | undefined {
  const matches = useMatches();
  for (let i = matches.length - 1; i >= 0; i--) {
    const handle = matches[i].handle as SectionHandle | undefined;
    if (handle?.section) return handle.section;
  }
  return undefined;
}
