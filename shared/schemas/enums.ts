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

export const noteCategories = ['finding', 'advice', 'follow-up', 'hazard'] as const;
export const noteCategorySchema = z.enum(noteCategories);
export type NoteCategory = z.infer<typeof noteCategorySchema>;
