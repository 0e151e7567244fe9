import { useId, type ReactNode } from 'react';
import { Link } from 'react-router';
import { upcomingSeason } from '@shared/schemas/plan';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { paths } from '@/config/paths';
import { can, useMe } from '@/lib/auth';
import { nearestCompassPoint } from '@/lib/compass';
import { formatNumber } from '@/lib/units';
import { GuidelineSection } from './guideline-section';
import { InvitationList } from './invitation-list';
import { InviteForm } from './invite-form';
import { MemberList } from './member-list';
import { StandForm } from './stand-form';
import { WhoCanChange } from './who-can-change';

function Section({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4 border-b border-rule pb-8">
      <h2 id={id} className="text-lg font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

const sunnySide = (deg: number) => `${nearestCompassPoint(deg).word} (${formatNumber(deg)}°)`;

function StandFacts({ stand }: { stand: Sugarbush }) {
  return (
    <dl className="grid max-w-xl grid-cols-[auto_1fr] gap-x-6 gap-y-2">
      <dt className="text-bark">Name</dt>
      <dd className="font-bold">{stand.name}</dd>
      <dt className="text-bark">Sunny side</dt>
      <dd className="tabular-nums">{sunnySide(stand.sunnyAzimuthDeg)}</dd>
    </dl>
  );
}

function BoundaryLine({ stand }: { stand: Sugarbush }) {
  const mayDraw = can(stand.role, 'edit-boundary');
  return (
    <p className="text-sm">
      {formatNumber(stand.treeCount)} trees in the register.{' '}
      {stand.boundary ? 'The boundary is drawn.' : 'No boundary drawn yet.'}{' '}
      <Link to={paths.map.href(stand.id)} className="underline underline-offset-4">
        {mayDraw ? 'Draw or import it on the map' : 'See it on the map'}
      </Link>
    </p>
  );
}

/**
 * A stand's settings: its name and sunny side, the guideline its advice follows, and the
 * team. The owner changes them; every other member reads them and sees who may change what.
 */
export function SettingsPage({ stand }: { stand: Sugarbush }) {
  const { data: me } = useMe();
  const season = upcomingSeason();
  const role = stand.role;
  const canStand = can(role, 'manage-stand');
  const canGuideline = can(role, 'choose-guideline');
  const canMembers = can(role, 'manage-members');
  const readOnly = !canStand || !canGuideline || !canMembers;

  return (
    <>
      <PageHeader title="Settings" subtitle={stand.name} actions={<UnitToggle />} />
      <div className="flex max-w-4xl flex-col gap-8">
        {readOnly && <WhoCanChange role={role} />}
        <Section title="The stand">
          {canStand ? <StandForm stand={stand} /> : <StandFacts stand={stand} />}
          <BoundaryLine stand={stand} />
        </Section>
        <Section title="The guideline">
          <GuidelineSection stand={stand} season={season} canChoose={canGuideline} />
        </Section>
        <Section title="The team">
          <MemberList
            sugarbushId={stand.id}
            standName={stand.name}
            myUserId={me?.user.id}
            canManage={canMembers}
          />
          {canMembers && (
            <>
              <h3 className="font-bold">Invite someone</h3>
              <InviteForm sugarbushId={stand.id} />
              <h3 className="font-bold">Invitations waiting</h3>
              <InvitationList sugarbushId={stand.id} />
            </>
          )}
        </Section>
      </div>
    </>
  );
}
