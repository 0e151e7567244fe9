import { z } from 'zod';

export const roles = ['owner', 'forester', 'tapper', 'consultant'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;
export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  forester: 'Forester',
  tapper: 'Tapper',
  consultant: 'Consultant',
};

export const species = [
  'sugar-maple',
  'red-maple',
  'black-maple',
  'silver-maple',
  'other',
] as const;
export const speciesSchema = z.enum(species);
export type Species = z.infer<typeof speciesSchema>;
export const speciesLabels: Record<Species, string> = {
  'sugar-maple': 'Sugar maple',
  'red-maple': 'Red maple',
  'black-maple': 'Black maple',
  'silver-maple': 'Silver maple',
  other: 'Other',
};

/** Register status of a tree: in production, held out by choice, dead, or cut and gone. */
export const treeStatuses = ['active', 'held-out', 'dead', 'removed'] as const;
export const treeStatusSchema = z.enum(treeStatuses);
export type TreeStatus = z.infer<typeof treeStatusSchema>;
export const treeStatusLabels: Record<TreeStatus, string> = {
  active: 'Active',
  'held-out': 'Held out',
  dead: 'Dead',
  removed: 'Removed',
};

export const collections = ['bucket', 'gravity', 'vacuum'] as const;
export const collectionSchema = z.enum(collections);
export type Collection = z.infer<typeof collectionSchema>;

/**
 * What a note is about. A hazard is for whoever works at the tree: it travels with the plan until
 * it is resolved. (Notes written before these names: `finding` became `health`, `advice` became
 * `tapping` on a tree and `management` on the whole stand.)
 */
export const noteCategories = ['health', 'hazard', 'tapping', 'management', 'follow-up'] as const;
export const noteCategorySchema = z.enum(noteCategories);
export type NoteCategory = z.infer<typeof noteCategorySchema>;
export const noteCategoryLabels: Record<NoteCategory, string> = {
  health: 'Tree health',
  hazard: 'Hazard',
  tapping: 'Tapping advice',
  management: 'Stand management',
  'follow-up': 'Follow-up',
};
