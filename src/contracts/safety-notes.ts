import type { Technology } from './scenario';

/** One caution the product shows, and where it applies. */
export interface SafetyNote {
  id: 'ignition' | 'uv' | 'mercury' | 'heat' | 'eyes' | 'electrician';
  text: string;
  /** technologies it concerns; empty means always */
  technologies: Technology[];
  /** shown with circuit planning even when no technology matches */
  circuits?: boolean;
}

/**
 * The usual cautions of lighting work (the product brief's safety notes). They defer to local codes
 * and licensed electricians; they are reminders, not instructions. Shared by the pages, the PDF
 * report and the read-only snapshot page so the wording is the same everywhere.
 */
export const SAFETY_NOTES: readonly SafetyNote[] = [
  { id: 'ignition', text: 'HID lamps are started by ignition pulses of several kilovolts: isolate the circuit and let lamps cool before relamping.', technologies: ['hps', 'mh', 'cmh'] },
  { id: 'uv', text: 'A metal-halide lamp with a broken outer bulb can emit harmful UV: switch it off and stop using it.', technologies: ['mh', 'cmh'] },
  { id: 'mercury', text: 'HID lamps contain mercury: dispose of spent lamps as the local rules require.', technologies: ['hps', 'mh', 'cmh'] },
  { id: 'heat', text: 'Lamps and fixtures run hot: keep the clearances the maker states from plants, walls and anything that burns.', technologies: [] },
  { id: 'eyes', text: 'Very bright LED sources can harm eyes: do not look into them.', technologies: ['led'] },
  {
    id: 'electrician',
    text: 'Wiring, ballasts, drivers and circuits are work for a licensed electrician under the local electrical code; circuit figures here are planning aids, and the local code decides.',
    technologies: [],
    circuits: true,
  },
];

/** The notes that apply to a set of technologies (all of them when none is given). */
export function safetyNotesFor(technologies?: readonly Technology[], circuits = true): SafetyNote[] {
  if (!technologies) return [...SAFETY_NOTES];
  return SAFETY_NOTES.filter((n) => (n.circuits ? circuits : n.technologies.length === 0 || n.technologies.some((t) => technologies.includes(t))));
}
