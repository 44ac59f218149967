/**
 * A ride-validation message as the road form speaks it: the file key it starts with
 * ("ride.power_W: must be...") is replaced by the label of the form field it belongs to
 * ("Rider power: must be..."), so the message names what is on screen. Messages for no field of the
 * form (the design, the model), or that only touch a field indirectly (a hub height derived from the
 * roughness length), keep their key.
 */
import { type RoadState, rideMessageField } from '../roadState';
import type { FieldGroup } from './roadField';

const LEADING_KEY = /^([A-Za-z_][\w.[\]]*?)(?: \([^)]*\))?:\s*/;

export function labelRideMessage(message: string, road: RoadState, groups: readonly FieldGroup[]): string {
  const key = rideMessageField(message, road);
  const path = message.match(LEADING_KEY)?.[1];
  if (key === null || path === undefined) return message;
  const direct = [key, `ride.${key}`, `air.${key}`].includes(path.replace('.distribution.', '.'));
  const field = groups.flatMap((g) => g.fields).find((f) => f.key === key);
  if (!direct || !field) return message;
  return message.replace(LEADING_KEY, `${field.label}: `);
}
