import type { AttentionItem, AttentionPage } from '@shared/schemas/attention';
import { isoDay } from '@shared/schemas/iso-date';
import type { Note } from '@shared/schemas/note';
import { upcomingSeason } from '@shared/schemas/plan';
import type { Photo } from '@shared/schemas/photo';
import { SUGARBUSH_ID } from './fixtures';

/** Test data for notes, photos and the needs-a-look queue. */

export const photo = (overrides: Partial<Photo> = {}): Photo => ({
  id: 21,
  sugarbushId: SUGARBUSH_ID,
  treeId: 7,
  noteId: null,
  contentType: 'image/jpeg',
  width: 1600,
  height: 1200,
  byteSize: 240_000,
  uploadedById: 11,
  uploadedByName: 'Pat consultant',
  createdAt: '2026-10-14T14:20:00.000Z',
  url: '/api/photos/21',
  thumbUrl: '/api/photos/21?size=thumb',
  ...overrides,
});

export const note = (overrides: Partial<Note> = {}): Note => ({
  id: 31,
  sugarbushId: SUGARBUSH_ID,
  treeId: 7,
  treeTag: '0412',
  authorId: 11,
  authorName: 'Pat consultant',
  category: 'health',
  body: 'Frost crack on the north face.',
  followUpOn: null,
  createdAt: '2026-10-14T14:10:00.000Z',
  resolvedAt: null,
  resolvedById: null,
  resolvedByName: null,
  photos: [],
  ...overrides,
});

export const attentionItem = (overrides: Partial<AttentionItem> = {}): AttentionItem => ({
  treeId: 7,
  tag: '0412',
  status: 'active',
  verdict: 'tap',
  taps: 1,
  warnings: [],
  openHazards: 0,
  nextFollowUpOn: null,
  reasons: [],
  ...overrides,
});

export const attentionPage = (
  items: AttentionItem[],
  extra: Partial<AttentionPage> = {},
): AttentionPage => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 25,
  season: upcomingSeason(),
  today: isoDay(),
  dueBy: isoDay(new Date(), 14),
  ...extra,
});
