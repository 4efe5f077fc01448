/// <reference lib="webworker" />
import '../../../contracts/zod-messages';
import type { ComputeCommand } from './protocol';
import { runCommand } from './run-command';

declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (event: MessageEvent<ComputeCommand>) => {
  self.postMessage(runCommand(event.data, () => performance.now()));
};
