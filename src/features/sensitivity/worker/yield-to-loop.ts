/**
 * Resolves on a fresh task of the event loop, so messages that arrived meanwhile (a cancel) are
 * handled first. A MessageChannel task is not throttled the way nested timers are (HTML Living
 * Standard, "Timers": nesting level above 5 clamps the delay to at least 4 ms).
 */
export function yieldToLoop(): Promise<void> {
  if (typeof MessageChannel === 'undefined') return new Promise((resolve) => setTimeout(resolve, 0));
  return new Promise((resolve) => {
    const { port1, port2 } = new MessageChannel();
    port1.onmessage = () => {
      port1.close();
      resolve();
    };
    port2.postMessage(null);
  });
}
