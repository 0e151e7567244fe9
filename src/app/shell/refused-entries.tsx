import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import {
  newClientId,
  refusedEntries,
  useSendFieldEntry,
  type FieldEntry,
  type RefusedEntry,
} from '@/lib/field-entries';
import { formatDate, formatDbh, useUnitSystem } from '@/lib/units';
import { RefusedMeasurementForm } from './refused/refused-measurement-form';
import { RefusedSapForm } from './refused/refused-sap-form';
import { RefusedTapholeForm } from './refused/refused-taphole-form';
import { RefusedWeatherForm } from './refused/refused-weather-form';

/** The entry in words: "Tree M-12: Reading of 14.2 in on Mar 3, 2026", "Sap of Mar 14, 2026". */
function describe(entry: FieldEntry, unit: 'in' | 'cm'): string {
  switch (entry.kind) {
    case 'measurement':
      return `Tree ${entry.tag}: Reading of ${formatDbh(entry.input.dbhCm, unit)} on ${formatDate(entry.input.measuredOn)}`;
    case 'taphole':
      return `Tree ${entry.tag}: Taphole for ${entry.input.season}`;
    case 'sap':
      return `Sap of ${formatDate(entry.input.collectedOn)}`;
    case 'weather':
      return `Weather of ${formatDate(entry.input.date)}`;
  }
}

/** The form that edits this kind of entry. */
function EditForm({
  refused,
  onSend,
  onCancel,
}: {
  refused: RefusedEntry;
  onSend: (next: FieldEntry) => void;
  onCancel: () => void;
}) {
  const { entry } = refused;
  switch (entry.kind) {
    case 'measurement':
      return (
        <RefusedMeasurementForm
          refused={{ ...refused, entry }}
          onCancel={onCancel}
          onSend={(input) => onSend({ ...entry, input })}
        />
      );
    case 'taphole':
      return (
        <RefusedTapholeForm
          refused={{ ...refused, entry }}
          onCancel={onCancel}
          onSend={(input) => onSend({ ...entry, input })}
        />
      );
    case 'sap':
      return (
        <RefusedSapForm
          refused={{ ...refused, entry }}
          onCancel={onCancel}
          onSend={(input) => onSend({ ...entry, input })}
        />
      );
    case 'weather':
      return (
        <RefusedWeatherForm
          refused={{ ...refused, entry }}
          onCancel={onCancel}
          onSend={(input) => onSend({ ...entry, input })}
        />
      );
  }
}

/** One refused entry: what it was, the server's reason, and the author's choices. */
function RefusedItem({ refused }: { refused: RefusedEntry }) {
  const { unit } = useUnitSystem();
  const send = useSendFieldEntry();
  const [editing, setEditing] = useState(false);
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const { entry } = refused;
  // A new id (the refused one was never stored, and its content may change).
  const resend = (next: FieldEntry) => {
    refusedEntries.remove(entry.clientId);
    send.mutate({ ...next, clientId: newClientId() });
  };
  return (
    <li className="rounded border border-rule bg-paper p-3">
      <p className="font-bold">{describe(entry, unit)}</p>
      <p className="mt-1 text-alert">{refused.message}</p>
      {editing ? (
        <EditForm refused={refused} onCancel={() => setEditing(false)} onSend={resend} />
      ) : confirmDiscard ? (
        <div role="group" aria-label="Discard the entry" className="mt-2">
          <p>Discard this entry? It was never stored and will be gone from this device.</p>
          <div className="mt-2 flex flex-wrap gap-3">
            <Button field onClick={() => refusedEntries.remove(entry.clientId)}>
              Discard it
            </Button>
            <Button field onClick={() => setConfirmDiscard(false)}>
              Keep it
            </Button>
          </div>
        </div>
      ) : (
        <div className="mt-2 flex flex-wrap gap-3">
          <Button field onClick={() => setEditing(true)}>
            Edit and send again
          </Button>
          {/* A reading refused for its content is sent again only after a look at it. */}
          {entry.kind !== 'measurement' && (
            <Button field onClick={() => resend(entry)}>
              Send again
            </Button>
          )}
          <Button field onClick={() => setConfirmDiscard(true)}>
            Discard…
          </Button>
        </div>
      )}
    </li>
  );
}

/** The entries the server refused on sync, kept on the device until their author decides. */
export function RefusedEntries({ entries }: { entries: readonly RefusedEntry[] }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="mt-3">
      <h2 id={headingId} className="text-lg font-bold">
        Not accepted by the server
      </h2>
      <p className="text-sm">Each stays here until you send it again or discard it.</p>
      <ul className="mt-2 flex flex-col gap-3">
        {entries.map((r) => (
          <RefusedItem key={r.entry.clientId} refused={r} />
        ))}
      </ul>
    </section>
  );
}
