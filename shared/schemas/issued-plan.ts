import { z } from 'zod';
import type { PlanTotals, VerdictKey } from '../rules/index';
import type { Page } from './list-query';
import { planQuerySchema, seasonSchema } from './plan';

/** `POST /api/sugarbushes/:id/issued-plans`: freeze this season's plan for the crew. */
export const issuePlanInputSchema = z.object({ season: seasonSchema });
export type IssuePlanInput = z.output<typeof issuePlanInputSchema>;

export const issuedSeasonParamsSchema = z.object({ season: seasonSchema });

/**
 * `GET …/issued-plans/:season`: `page`/`pageSize` page the frozen items, `changesPage`/
 * `changesPageSize` page the changes since; `version` reads an earlier issue (default the latest).
 */
export const issuedPlanQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  changesPage: z.coerce.number().int().min(1).default(1),
  changesPageSize: z.coerce.number().int().min(1).max(500).default(50),
  version: z.coerce.number().int().min(1).optional(),
});
export type IssuedPlanQuery = z.output<typeof issuedPlanQuerySchema>;

export const seasonProgressQuerySchema = z.object({ season: seasonSchema.optional() });

/** The field sheet takes the plan's filters (not its sort: the sheet is in walking order). */
export const fieldSheetQuerySchema = planQuerySchema.omit({ sort: true });
export type FieldSheetQuery = z.output<typeof fieldSheetQuerySchema>;

export interface IssuedPlacement {
  azimuthDeg: number;
  heightCm: number;
}

/** What the crew is told at one tree. */
export interface IssuedItem {
  treeId: number;
  tag: string;
  verdict: VerdictKey;
  taps: number;
  placements: IssuedPlacement[];
  bitCm: number | null;
  depthCm: number | null;
  /** The text of the tree's open hazard notes when the plan was issued. */
  hazards: string[];
}

export interface IssuedPlanHeader {
  id: number;
  season: number;
  version: number;
  issuedAt: string;
  /** Null once the person's account is gone; `name` is kept as it was. */
  issuedBy: { id: number | null; name: string };
  profile: { key: string; label: string; source: string; adviceVersion: number };
  totals: PlanTotals;
}

/** How a tree's advice today differs from the issued copy. */
export const planChangeKinds = ['added', 'removed', 'taps', 'placements', 'verdict'] as const;
export type PlanChangeKind = (typeof planChangeKinds)[number];

/** A tree's call in one plan: its verdict, taps and where. */
export interface TreeCall {
  verdict: VerdictKey;
  taps: number;
  placements: IssuedPlacement[];
}

export interface PlanChange {
  treeId: number;
  tag: string;
  kinds: PlanChangeKind[];
  /** Null: the tree was not in the issued copy (added to the register since). */
  issued: TreeCall | null;
  /** Null: the tree has no advice today (it left the register). */
  current: TreeCall | null;
}

export interface PlanChanges extends Page<PlanChange> {
  /** Trees changed, by kind (a tree may count under several). */
  byKind: Record<PlanChangeKind, number>;
}

export interface IssuedPlanResponse {
  plan: IssuedPlanHeader;
  /** The latest version issued for the season (a newer one than `plan` when reading an older). */
  latestVersion: number;
  items: Page<IssuedItem>;
  changes: PlanChanges;
}

export interface IssuedPlanVersions {
  items: Omit<IssuedPlanHeader, 'totals'>[];
}

/** Drilled against planned for a season. */
export interface SeasonProgress {
  season: number;
  /** Where the planned figures come from: the latest issued copy, or today's advice. */
  plannedFrom: 'issued' | 'advice';
  issuedVersion: number | null;
  plannedTaps: number;
  /** Tapholes recorded for the season, on any tree of the stand. */
  drilledTaps: number;
  treesToTap: number;
  /** Trees to tap with at least their planned taps recorded this season. */
  treesDone: number;
}

/** One line of the printed field sheet. */
export interface FieldSheetLine extends IssuedItem {
  /** Where the tree stands in the walking order, from 1. */
  position: number;
}

export interface FieldSheetPage extends Page<FieldSheetLine> {
  season: number;
  printing: 'issued' | 'advice';
  /** The issued copy printed, when there is one. */
  issued: { version: number; issuedAt: string; issuedBy: string } | null;
  profile: { key: string; label: string; source: string };
  standName: string;
  /** Taps over every line of the sheet (all pages). */
  taps: number;
}
