import type { Role } from '@shared/schemas/enums';
import { permissionLabels, type Permission } from '@shared/schemas/permissions';
import { can, roleLabels } from '@/lib/auth';

const actions = Object.keys(permissionLabels) as Permission[];

/** "an owner", "a tapper". */
export const withArticle = (role: Role) => {
  const word = roleLabels[role].toLowerCase();
  return /^[aeiou]/.test(word) ? `an ${word}` : `a ${word}`;
};

/** What the role lets its holder do in the stand, from the shared permission table. */
export function RoleSummary({ role }: { role: Role }) {
  return (
    <div>
      <p className="font-bold">As {withArticle(role)} you can:</p>
      <ul className="mt-1 list-disc pl-5">
        <li>See every tree, the map, the advice and the season plan</li>
        {actions
          .filter((action) => can(role, action))
          .map((action) => (
            <li key={action}>{permissionLabels[action]}</li>
          ))}
      </ul>
    </div>
  );
}
