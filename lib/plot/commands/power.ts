/** Commands on the supply, its feeders and circuits, and the rigging allowance. */
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import {
  type Circuit,
  type Feeder,
  type PowerSettings,
  type RiggingSettings,
  circuit as circuitSchema,
  feeder as feederSchema,
  power as powerSchema,
  rigging as riggingSchema,
} from '../schema/power';

type SupplyChanges = Partial<Pick<PowerSettings, 'system' | 'phaseVoltageV' | 'continuousLimitPct'>>;

/** Edit the supply: single or three phase, phase voltage, continuous-load limit. */
export const updateSupply = defineCommand<SupplyChanges>({
  name: 'power.supply',
  label: () => 'Edit supply',
  apply(draft, changes) {
    const merged = checked(powerSchema, { ...draft.power, ...changes }, 'power');
    if (merged.system === 'single' && draft.power.circuits.some((entry) => entry.phase !== 'L1'))
      throw new CommandRefused(
        'power.system: move every circuit to L1 before changing to a single-phase supply',
      );
    Object.assign(draft.power, merged);
  },
});

/** Add a feeder (a supply run, distribution box or dimmer rack input). */
export const addFeeder = defineCommand<Omit<Feeder, 'id'> & { id?: string }>({
  name: 'power.feeder.add',
  label: ({ name }) => `Add feeder ${name}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'feed');
    requireFreeId(draft, id);
    draft.power.feeders.push(checked(feederSchema, { ...args, id }, 'new feeder'));
  },
});

export const updateFeeder = defineCommand<{ id: string; changes: Partial<Omit<Feeder, 'id'>> }>({
  name: 'power.feeder.update',
  label: () => 'Edit feeder',
  apply(draft, { id, changes }) {
    const index = draft.power.feeders.findIndex((line) => line.id === id);
    if (index < 0) throw new CommandRefused(`There is no feeder with id "${id}".`);
    draft.power.feeders[index] = checked(
      feederSchema,
      { ...draft.power.feeders[index], ...changes, id },
      `feeder ${id}`,
    );
  },
});

/** Delete a feeder; its circuits stay, fed from no named feeder. */
export const deleteFeeder = defineCommand<{ id: string }>({
  name: 'power.feeder.delete',
  label: () => 'Delete feeder',
  apply(draft, { id }) {
    findOrRefuse(draft.power.feeders, id, 'feeder');
    draft.power.feeders = draft.power.feeders.filter((line) => line.id !== id);
    for (const entry of draft.power.circuits) if (entry.feederId === id) entry.feederId = null;
  },
});

function checkCircuit(
  draft: { power: PowerSettings },
  entry: Circuit,
  where: string,
  skipIndex: number,
): Circuit {
  const value = checked(circuitSchema, entry, where);
  if (draft.power.circuits.some((other, index) => index !== skipIndex && other.address === value.address))
    throw new CommandRefused(`${where}.address: there is already a circuit "${value.address}"`);
  if (value.feederId !== null && !draft.power.feeders.some((line) => line.id === value.feederId))
    throw new CommandRefused(`${where}.feederId: there is no feeder with id "${value.feederId}"`);
  if (draft.power.system === 'single' && value.phase !== 'L1')
    throw new CommandRefused(`${where}.phase: must be L1 on a single-phase supply`);
  return value;
}

/** List a circuit (or dimmer) with its rating. */
export const addCircuit = defineCommand<Circuit>({
  name: 'power.circuit.add',
  label: ({ address }) => `Add circuit ${address}`,
  apply(draft, entry) {
    draft.power.circuits.push(checkCircuit(draft, entry, 'new circuit', -1));
  },
});

/** Edit a circuit; renaming its address also renames it on the fixtures that use it. */
export const updateCircuit = defineCommand<{ address: string; changes: Partial<Circuit> }>({
  name: 'power.circuit.update',
  label: () => 'Edit circuit',
  apply(draft, { address, changes }) {
    const index = draft.power.circuits.findIndex((entry) => entry.address === address);
    if (index < 0) throw new CommandRefused(`There is no circuit "${address}".`);
    const value = checkCircuit(
      draft,
      { ...draft.power.circuits[index], ...changes },
      `circuit ${address}`,
      index,
    );
    draft.power.circuits[index] = value;
    if (value.address !== address)
      for (const unit of draft.fixtures) if (unit.circuit === address) unit.circuit = value.address;
  },
});

/** Remove a circuit from the list; fixtures keep the address written on them. */
export const deleteCircuit = defineCommand<{ address: string }>({
  name: 'power.circuit.delete',
  label: () => 'Delete circuit',
  apply(draft, { address }) {
    if (!draft.power.circuits.some((entry) => entry.address === address))
      throw new CommandRefused(`There is no circuit "${address}".`);
    draft.power.circuits = draft.power.circuits.filter((entry) => entry.address !== address);
  },
});

/** Edit the rigging allowance per unit. */
export const updateRigging = defineCommand<Partial<RiggingSettings>>({
  name: 'rigging.update',
  label: () => 'Edit rigging allowance',
  apply(draft, changes) {
    draft.rigging = checked(riggingSchema, { ...draft.rigging, ...changes }, 'rigging');
  },
});
