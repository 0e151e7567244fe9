import type { Collection } from '@shared/schemas/enums';

export const collectionLabels: Record<Collection, string> = {
  bucket: 'Bucket',
  gravity: 'Gravity tubing',
  vacuum: 'Vacuum tubing',
};
