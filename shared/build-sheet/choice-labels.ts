// The words for every choice a build sheet offers, said once: the editor's menus, the public page,
// its JSON-fed screens and the cards read them from here, so a choice is never named two ways.
import type {
  ASPIRATIONS,
  BRAKE_TYPES,
  ENGINE_LAYOUTS,
  FRAME_KINDS,
  LIMITED_SLIP_TYPES,
  MADE_BY_KINDS,
  SPRING_TYPES,
  SUSPENSION_TYPES,
  TRANSMISSION_TYPES,
} from '../schemas/build-sections';
import type { FUEL_LEVELS } from '../schemas/build';
import type { PROVENANCES } from '../schemas/figure';

type Labels<T extends readonly string[]> = Record<T[number], string>;

export const ENGINE_LAYOUT_LABELS: Labels<typeof ENGINE_LAYOUTS> = { inline: 'Inline', V: 'V', flat: 'Flat', rotary: 'Rotary', electric: 'Electric' };
export const ASPIRATION_LABELS: Labels<typeof ASPIRATIONS> = { natural: 'Natural', supercharged: 'Supercharged', turbocharged: 'Turbocharged' };
export const TRANSMISSION_LABELS: Labels<typeof TRANSMISSION_TYPES> = {
  manual: 'Manual',
  sequential: 'Sequential',
  'dog-engagement': 'Dog-engagement',
  automatic: 'Automatic',
  cvt: 'CVT',
  'direct-drive': 'Direct drive',
};
export const LIMITED_SLIP_LABELS: Labels<typeof LIMITED_SLIP_TYPES> = {
  open: 'Open',
  'clutch-type': 'Clutch-type limited slip',
  'gear-type': 'Gear-type limited slip',
  locker: 'Locker',
  spool: 'Spool',
  electronic: 'Electronic limited slip',
};
export const FRAME_LABELS: Labels<typeof FRAME_KINDS> = { factory: 'Factory', modified: 'Modified factory', custom: 'Custom tube' };
// The trade writes some with a hyphen (double-wishbone, coil-over, four-link) and some without.
export const SUSPENSION_LABELS: Labels<typeof SUSPENSION_TYPES> = {
  'double-wishbone': 'Double-wishbone',
  strut: 'Strut',
  'beam-axle': 'Beam axle',
  'solid-axle': 'Solid axle',
  'four-link': 'Four-link',
  'triangulated-four-link': 'Triangulated four-link',
  'ladder-bar': 'Ladder bar',
  leaf: 'Leaf',
  'independent-rear': 'Independent rear',
  other: 'Other',
};
export const SPRING_LABELS: Labels<typeof SPRING_TYPES> = { 'coil-over': 'Coil-over', coil: 'Coil', leaf: 'Leaf', air: 'Air', torsion: 'Torsion bar', 'transverse-leaf': 'Transverse leaf' };
export const BRAKE_TYPE_LABELS: Labels<typeof BRAKE_TYPES> = { disc: 'Disc', drum: 'Drum', none: 'None' };
export const MADE_BY_LABELS: Labels<typeof MADE_BY_KINDS> = { owner: 'Owner-built', shop: 'A shop or person', donor: 'From a donor vehicle', new: 'Bought new' };
export const FUEL_LEVEL_LABELS: Labels<typeof FUEL_LEVELS> = { empty: 'Empty', quarter: 'A quarter', half: 'Half', 'three-quarters': 'Three quarters', full: 'Full' };

/** The provenance menu of a figure. */
export const PROVENANCE_LABELS: Labels<typeof PROVENANCES> = { measured: 'Measured', estimated: 'Estimated', target: 'Target' };
/** The mark printed beside a figure that was not measured; a measured figure is plain. */
export const PROVENANCE_MARKS: Labels<typeof PROVENANCES> = { measured: '', estimated: 'est.', target: 'target' };

/** A label inside a sentence: "Double-wishbone" becomes "double-wishbone"; "CVT" and "V" stay as they are. */
export const inText = (label: string) => (label.length > 1 && label[1] === label[1]!.toLowerCase() ? label[0]!.toLowerCase() + label.slice(1) : label);
