/// <reference lib="webworker" />
import '../../../contracts/zod-messages';
import { createCommandHandler } from './handle-command';
import type { AnalysisCommand } from './protocol';
import { yieldToLoop } from './yield-to-loop';

declare const self: DedicatedWorkerGlobalScope;

const handle = createCommandHandler({ post: (reply) => self.postMessage(reply), pause: yieldToLoop, now: () => performance.now() });

self.onmessage = (event: MessageEvent<AnalysisCommand>) => {
  void handle(event.data);
};
