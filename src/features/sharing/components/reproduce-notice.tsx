import type { ReproduceReport } from '../../../engine/reproduce';
import { Notice } from '../../../components/ui/notice';

const SHOWN = 12;

function titleOf(differing: number): string {
  if (differing === 0) return 'The figures match, but the inputs are not the ones stored';
  return differing === 1 ? '1 figure differs from the published one' : `${differing} figures differ from the published ones`;
}

/**
 * Says whether the current engine, run in this browser on the stored inputs, gets the published
 * figures back; if not, which figures differ and the two engine versions.
 */
export function ReproduceNotice({ report, hashMatches }: { report: ReproduceReport; hashMatches: boolean }) {
  if (report.reproduces && hashMatches) {
    return (
      <Notice tone="ok" title="These figures reproduce">
        <p>
          This page recomputed every figure from the stored inputs with engine {report.currentEngineVersion} and got the published result back
          (published with engine {report.storedEngineVersion}). The inputs' SHA-256 matches the one stored with the snapshot.
        </p>
      </Notice>
    );
  }
  return (
    <Notice tone="caution" title={titleOf(report.differences.length)}>
      <p>
        Published with engine {report.storedEngineVersion}; recomputed here with engine {report.currentEngineVersion}.
        {hashMatches ? '' : ' The inputs do not hash to the SHA-256 stored with the snapshot.'}
      </p>
      {report.differences.length ? (
        <table className="mt-2 w-full border-collapse text-left">
          <caption className="sr-only">Figures that differ</caption>
          <thead>
            <tr className="border-b border-gold-800/30">
              <th scope="col" className="pr-2 font-medium">Figure</th>
              <th scope="col" className="px-2 font-medium">Published</th>
              <th scope="col" className="pl-2 font-medium">Recomputed</th>
            </tr>
          </thead>
          <tbody>
            {report.differences.slice(0, SHOWN).map((d) => (
              <tr key={d.path}>
                <td className="figure pr-2">{d.path}</td>
                <td className="figure px-2">{String(d.stored)}</td>
                <td className="figure pl-2">{String(d.recomputed)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {report.differences.length > SHOWN ? <p className="mt-1">…and {report.differences.length - SHOWN} more.</p> : null}
    </Notice>
  );
}
