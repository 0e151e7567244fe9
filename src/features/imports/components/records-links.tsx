import type { Role } from '@shared/schemas/enums';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { exportLinks } from '../export-links';
import { importableKinds } from './import-panel';

/** The register's way in and out: import for whoever may, the exports for every member. */
export function RecordsLinks({
  sugarbushId,
  role,
}: {
  sugarbushId: number;
  role: Role | undefined;
}) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
      {importableKinds(role).length > 0 && (
        <TextLink to={paths.imports.href(sugarbushId)}>Import from CSV</TextLink>
      )}
      <details className="relative">
        <summary className="inline-flex min-h-11 cursor-pointer items-center underline underline-offset-4 md:min-h-0">
          Download
        </summary>
        <ul className="absolute right-0 z-10 mt-1 flex w-56 flex-col rounded border border-rule bg-paper p-2 shadow">
          {exportLinks(sugarbushId).map((l) => (
            <li key={l.href}>
              <a
                className="flex min-h-11 items-center underline underline-offset-4 md:min-h-8"
                href={l.href}
                download
              >
                {l.label}
              </a>
            </li>
          ))}
        </ul>
      </details>
    </div>
  );
}
