import type { AuditItem } from '@shared/schemas/audit';
import { roleLabels, treeStatusLabels, type Role, type TreeStatus } from '@shared/schemas/enums';
import { formatDbh, formatLength, formatPercent, type LengthUnit } from '@/lib/units';

/** What the trail's kinds are called on the page. */
export const auditKindLabels: Record<string, string> = {
  sugarbush: 'The stand',
  tree: 'Trees',
  measurement: 'Measurements',
  taphole: 'Tapholes',
  note: 'Notes',
  member: 'Team',
  invitation: 'Invitations',
  basemap: 'Map backgrounds',
  photo: 'Photos',
  'weather-day': 'Weather',
  'sap-entry': 'Sap',
};

type Detail = Record<string, unknown>;
const num = (d: Detail, key: string) => (typeof d[key] === 'number' ? (d[key] as number) : null);
const role = (v: unknown) => roleLabels[v as Role]?.toLowerCase() ?? String(v);

/** The columns of a stand a change named, in words. */
const standFields: Record<string, string> = {
  name: 'name',
  boundary: 'boundary',
  profile: 'guideline',
  custom_profile: 'custom guideline',
  sunny_azimuth_deg: 'sunny side',
};

function measurementWords(action: string, d: Detail, unit: LengthUnit) {
  const dbh = num(d, 'dbhCm');
  const crown = num(d, 'crownDiebackPct');
  const what = [
    dbh !== null ? `DBH ${formatDbh(dbh, unit)}` : null,
    crown !== null ? `crown dieback ${formatPercent(crown)}` : null,
  ]
    .filter(Boolean)
    .join(', ');
  const on = typeof d.measuredOn === 'string' ? ` of ${d.measuredOn}` : '';
  return action === 'correct'
    ? `Corrected the measurement${on} to ${what}`
    : `Recorded ${what || 'a measurement'}${on}`;
}

function tapholeWords(d: Detail, unit: LengthUnit) {
  const height = num(d, 'heightCm');
  const bearing = num(d, 'azimuthDeg');
  const parts = [
    height !== null ? `at ${formatLength(height, unit === 'in' ? 'in' : 'cm', 0)}` : null,
    bearing !== null ? `bearing ${Math.round(bearing)}°` : null,
  ].filter(Boolean);
  const season = num(d, 'season');
  return `Recorded a taphole${season !== null ? ` for ${season}` : ''}${parts.length ? ` ${parts.join(', ')}` : ''}`;
}

/** One entry of the trail as a short sentence, in the user's unit. */
export function auditWords(item: AuditItem, unit: LengthUnit): string {
  const d = (item.detail && typeof item.detail === 'object' ? item.detail : {}) as Detail;
  switch (`${item.kind}:${item.action}`) {
    case 'measurement:create':
    case 'measurement:correct':
      return measurementWords(item.action, d, unit);
    case 'taphole:create':
      return tapholeWords(d, unit);
    case 'tree:create':
      return 'Added the tree';
    case 'tree:update': {
      const fields = Object.keys(d).filter((k) => k !== 'earlier');
      if (typeof d.status === 'string' && fields.length === 1)
        return `Set the status to ${treeStatusLabels[d.status as TreeStatus] ?? d.status}`;
      return fields.length ? `Changed the tree’s ${fields.join(', ')}` : 'Edited the tree';
    }
    case 'note:create':
      return 'Wrote a note';
    case 'sugarbush:create':
      return 'Started the stand';
    case 'sugarbush:update': {
      // Entries name the changed columns: as a list, or as `fields` beside the earlier values.
      const fields = (
        Array.isArray(item.detail) ? item.detail : Array.isArray(d.fields) ? d.fields : []
      ) as string[];
      const words = fields.map((f) => standFields[f] ?? f);
      return words.length ? `Changed the stand’s ${words.join(' and ')}` : 'Changed the stand';
    }
    case 'member:change-role':
      return `Changed a member’s role from ${role(d.from)} to ${role(d.to)}`;
    case 'member:remove':
      return `Removed ${typeof d.email === 'string' ? d.email : 'a member'} from the team`;
    case 'invitation:invite':
      return `Invited ${String(d.email ?? 'someone')} as ${role(d.role)}`;
    case 'invitation:resend':
      return 'Sent an invitation again';
    case 'invitation:revoke':
      return 'Withdrew an invitation';
    case 'invitation:accept':
      return `Joined the team as ${role(d.role)}`;
    case 'basemap:create':
      return 'Uploaded a map background';
    case 'photo:create':
      return 'Added a photo';
    case 'weather-day:record':
    case 'weather-day:import':
    case 'weather-day:replace': {
      const on = typeof d.date === 'string' ? ` for ${d.date}` : '';
      const how =
        item.action === 'import'
          ? 'Imported the weather'
          : item.action === 'replace'
            ? 'Replaced the weather'
            : 'Recorded the weather';
      return `${how}${on}`;
    }
    case 'sap-entry:create': {
      const on = typeof d.collectedOn === 'string' ? ` of ${d.collectedOn}` : '';
      return `Recorded the sap${on}`;
    }
    case 'sap-entry:correct':
      return `Corrected a sap entry (${
        Object.keys(d)
          .filter((k) => k !== 'earlier')
          .join(', ') || 'no change'
      })`;
    default:
      return `${item.action} ${item.kind}`;
  }
}

const timeFormat = new Intl.DateTimeFormat('en-US', {
  dateStyle: 'medium',
  timeStyle: 'short',
  timeZone: 'UTC',
});

/** "Dec 2, 2026, 12:49 AM UTC". */
export const auditTime = (iso: string) => {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : `${timeFormat.format(date)} UTC`;
};
