import type { Technology } from '../contracts/scenario';
import { HID } from './technology';

/** Which cautions apply where the notes are shown. */
export interface SafetyNotesProps {
  /** technologies in view; HID notes appear when any is HPS, MH or CMH, the LED note when any is LED */
  technologies?: readonly Technology[];
  /** show the note on wiring and circuit loading */
  circuits?: boolean;
  className?: string;
}

/**
 * The usual cautions of lighting work, shown beside lamp data and circuit planning. They defer to
 * local codes and licensed electricians; they are reminders, not instructions.
 */
export function SafetyNotes({ technologies, circuits = false, className }: SafetyNotesProps) {
  const all = technologies === undefined;
  const hid = all || technologies.some((t) => HID.has(t));
  const mh = all || technologies.some((t) => t === 'mh' || t === 'cmh');
  const led = all || technologies.includes('led');
  return (
    <aside aria-label="Safety notes" className={`rounded-md border border-gold-800/30 bg-gold-100 px-3 py-2 text-sm text-gold-800 ${className ?? ''}`}>
      <p className="font-semibold">Safety notes</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {hid ? <li>HID lamps are started by ignition pulses of several kilovolts: isolate the circuit and let lamps cool before relamping.</li> : null}
        {mh ? <li>A metal-halide lamp with a broken outer bulb can emit harmful UV: switch it off and stop using it.</li> : null}
        {hid ? <li>HID lamps contain mercury: dispose of spent lamps as the local rules require.</li> : null}
        <li>Lamps and fixtures run hot: keep the clearances the maker states from plants, walls and anything that burns.</li>
        {led ? <li>Very bright LED sources can harm eyes: do not look into them.</li> : null}
        {circuits || all ? (
          <li>
            Wiring, ballasts, drivers and circuits are work for a licensed electrician under the local electrical code; the circuit figures
            here are planning aids, and the local code decides.
          </li>
        ) : null}
      </ul>
    </aside>
  );
}
