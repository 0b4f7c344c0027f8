'use client';

import { useMemo } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { powerCheck } from '@/lib/plot';
import { formatA, formatPct } from './format';
import { LoadBadge } from './LoadBadge';

/**
 * Under a unit's Circuit field: the load of that circuit now (a planning estimate, with what it assumes
 * and where the cautions are), or that it is not listed.
 */
export function CircuitLoadNote({ address }: { address: string | null }) {
  const { document } = useEditor();
  const load = useMemo(() => powerCheck(document), [document]);
  if (address === null) return null;
  const circuit = load.circuits.find((entry) => entry.address === address);
  if (!circuit)
    return (
      <p className="panel-note" data-readout="circuitLoad">
        Circuit {address} is not listed in the Power tab: no rating is known.
      </p>
    );
  return (
    <p
      className="panel-note power-circuit-note"
      data-readout="circuitLoad"
      data-value={String(circuit.currentA)}
    >
      {address} at full: {formatA(circuit.currentA)} of {circuit.ratingA} A ({formatPct(circuit.ratingPct)}){' '}
      <LoadBadge flag={circuit.flag} limitPct={load.continuousLimitPct} />
      <span className="power-circuit-note-caveat">
        Planning estimate: nameplate at full, unity power factor — see the Power tab.
      </span>
    </p>
  );
}
