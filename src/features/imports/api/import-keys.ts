/** Keys of the import page's reads: only an import's steps, while it runs. */
export const importKeys = {
  all: ['imports'] as const,
  progress: (sugarbushId: number, importId: string) =>
    [...importKeys.all, sugarbushId, 'progress', importId] as const,
};
