import { bundleSuite } from './bundle';
import { engineSuite } from './engine';
import { loadSuite } from './load';
import { measurementsSuite } from './measurements';
import { sensitivitySuite } from './sensitivity';
import { sharingSuite } from './sharing';
import type { BenchSuite } from './types';

/** Every benchmark section, in report order; `npm run bench -- <name>` runs only the named ones. */
export const suites: BenchSuite[] = [engineSuite, measurementsSuite, sensitivitySuite, bundleSuite, sharingSuite, loadSuite];
