import type { Role } from '@shared/schemas/enums';
import { permissionLabels, type Permission } from '@shared/schemas/permissions';
import { can, roleLabels, rolesFor } from '@/lib/auth';

/** The jobs this page is about, and the boundary, which is drawn on the map. */
export const settingsPermissions: readonly Permission[] = [
  'manage-stand',
  'choose-guideline',
  'manage-members',
  'edit-boundary',
];

const rolesText = (permission: Permission) =>
  rolesFor(permission)
    .map((r) => roleLabels[r])
    .join(', ');

/** Who may change what on this page, straight from the permission table, and what you may. */
export function WhoCanChange({ role }: { role: Role }) {
  return (
    <section
      aria-labelledby="who-can-change"
      className="rounded border border-rule bg-frost/40 px-4 py-3"
    >
      <h2 id="who-can-change" className="font-bold">
        Who can change what
      </h2>
      <p className="mt-1 max-w-prose text-sm">
        You are {role === 'owner' ? 'an' : 'a'} {roleLabels[role].toLowerCase()} here, so you can
        read these settings. Ask someone with the role named to change them.
      </p>
      <table className="mt-2 w-full text-left text-sm">
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className="py-1 pr-3 font-bold">
              Change
            </th>
            <th scope="col" className="py-1 pr-3 font-bold">
              Who may
            </th>
            <th scope="col" className="py-1 font-bold">
              You
            </th>
          </tr>
        </thead>
        <tbody>
          {settingsPermissions.map((p) => (
            <tr key={p} className="border-b border-rule last:border-0">
              <th scope="row" className="py-1 pr-3 font-normal">
                {permissionLabels[p]}
              </th>
              <td className="py-1 pr-3">{rolesText(p)}</td>
              <td className="py-1">{can(role, p) ? 'Yes' : 'No'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
