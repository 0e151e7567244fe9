import {
  species as speciesList,
  treeStatuses,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import { bothWays, oneOf, parseListParams, useListSearchParams } from '@/lib/list-search-params';
import { TREE_PAGE_SIZE } from '../api/get-trees';
import type { TreeListFilters, TreeSort } from '../api/tree-keys';

const sorts: readonly TreeSort[] = bothWays(['tag', 'dbh', 'status', 'species']);

const parseRegisterParams = (params: URLSearchParams): TreeListFilters => ({
  ...parseListParams(params, { sorts, defaultSort: 'tag', pageSize: TREE_PAGE_SIZE }),
  status: oneOf<TreeStatus>(treeStatuses, params.get('status')),
  species: oneOf<Species>(speciesList, params.get('species')),
});

/** The register's page, sort, search and filters, kept in the URL so a view can be shared. */
export const useRegisterSearchParams = () => useListSearchParams(parseRegisterParams);
