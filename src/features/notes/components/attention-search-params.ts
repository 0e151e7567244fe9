import { warningCodes, type WarningCode } from '@shared/rules/index';
import { attentionReasons, attentionSorts, type AttentionReason } from '@shared/schemas/attention';
import { oneOf, parseListParams, useListSearchParams } from '@/lib/list-search-params';
import { parseSeason, seasonParam } from '@/lib/season';
import { ATTENTION_PAGE_SIZE } from '../api/get-attention';
import type { AttentionFilters } from '../api/note-keys';

export type AttentionSort = (typeof attentionSorts)[number];

const parseAttentionParams = (params: URLSearchParams): AttentionFilters => ({
  season: parseSeason(params.get('season')),
  ...parseListParams<AttentionSort>(params, {
    sorts: attentionSorts,
    defaultSort: 'priority',
    pageSize: ATTENTION_PAGE_SIZE,
  }),
  reason: oneOf<AttentionReason>(attentionReasons, params.get('reason')),
  warning: oneOf<WarningCode>(warningCodes, params.get('warning')),
});

/** The upcoming season and the default order stay out of the URL. */
const toAttentionParam = (key: string, value: unknown) => {
  if (key === 'season') return seasonParam(value as number);
  if (key === 'sort' && value === 'priority') return undefined;
  return value;
};

/** The queue's season, page, order and filters, kept in the URL so a view can be shared. */
export const useAttentionSearchParams = () =>
  useListSearchParams(parseAttentionParams, toAttentionParam);
