import {
  species as speciesList,
  treeStatuses,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import { crownDiebackClasses } from '@shared/schemas/measurement';
import { bothWays, oneOf, parseListParams, useListSearchParams } from '@/lib/list-search-params';
import { FIRST_SEASON, lastSeason } from '@/lib/season';
import { TREE_PAGE_SIZE } from '../api/get-trees';
import type { TreeListFilters, TreeSort } from '../api/tree-keys';

const sorts: readonly TreeSort[] = bothWays(['tag', 'dbh', 'status', 'species']);

const parseRegisterParams = (params: URLSearchParams): TreeListFilters => ({
  ...parseListParams(params, { sorts, defaultSort: 'tag', pageSize: TREE_PAGE_SIZE }),
  status: oneOf<TreeStatus>(treeStatuses, params.get('status')),
  species: oneOf<Species>(speciesList, params.get('species')),
  ...diebackParams(params),
});

/** `?dieback=15&diebackSeason=2024`: trees rated in one 5 % class (in that season's round). */
function diebackParams(
  params: URLSearchParams,
): Pick<TreeListFilters, 'dieback' | 'diebackSeason'> {
  const dieback = Number(params.get('dieback') ?? NaN);
  if (!crownDiebackClasses.includes(dieback)) return {};
  const season = Number(params.get('diebackSeason') ?? NaN);
  return {
    dieback,
    ...(Number.isInteger(season) && season >= FIRST_SEASON && season <= lastSeason()
      ? { diebackSeason: season }
      : {}),
  };
}

/** The register's page, sort, search and filters, kept in the URL so a view can be shared. */
export const useRegisterSearchParams = () => useListSearchParams(parseRegisterParams);
