import { measurementLines } from '../../../src/contracts/api/snapshots';
import type { PublicSnapshot } from '../../../src/contracts/api/snapshots';
import { compareResults, computeScenario } from '../../../src/engine';

/**
 * The PDF report of a snapshot, built from its stored inputs: the stored result, and a reproduce
 * statement from recomputing those inputs with the running engine. jspdf loads on first use only.
 */
export async function snapshotReportPdf(snapshot: PublicSnapshot, link: string, now = new Date()): Promise<Uint8Array> {
  const { buildReportPdf } = await import('../../../src/lib/report/build-report');
  return buildReportPdf({
    scenario: snapshot.scenario,
    result: snapshot.result,
    notes: snapshot.notes || undefined,
    link,
    generatedAt: now.toISOString(),
    reproduce: compareResults(snapshot.result, computeScenario(snapshot.scenario)),
    measurements: measurementLines(snapshot.measurements),
  });
}
