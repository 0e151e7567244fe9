import { useMutation } from '@tanstack/react-query';
import type { GuidelinePreview } from '@shared/schemas/guideline-preview';
import { api } from '@/lib/api-client';
import type { GuidelineChoice } from './update-guideline';

/** What the choice would do to the season's plan; the advisor runs on the server, nothing is saved. */
export const previewGuideline = (sugarbushId: number, choice: GuidelineChoice, season: number) =>
  api.post<GuidelinePreview>(`/sugarbushes/${sugarbushId}/guideline-preview`, {
    ...choice,
    season,
  });

export const usePreviewGuideline = (sugarbushId: number) =>
  useMutation({
    mutationFn: ({ choice, season }: { choice: GuidelineChoice; season: number }) =>
      previewGuideline(sugarbushId, choice, season),
  });
