/**
 * Resolves in a later task of the event loop (a message to a channel of its own, which, unlike a
 * nested setTimeout, is not clamped to 4 ms), so that the browser can paint and answer input in between:
 * the explorer's work in slices (the layout, cytoscape's set-up) yields with it.
 */
export function nextTask(): Promise<void> {
  return new Promise((resolve) => {
    const ch = new MessageChannel();
    ch.port1.onmessage = () => {
      ch.port1.close();
      resolve();
    };
    ch.port2.postMessage(null);
  });
}
