/**
 * Runs `work` over the items in `lanes` concurrent lanes (e.g. one more
 * than an executor has workers), taking items in order and checking for
 * cancellation before each; the results keep the items' order.
 */
export async function inLanes<T, R>(
  items: readonly T[],
  lanes: number,
  signal: AbortSignal,
  work: (item: T) => Promise<R>,
): Promise<R[]> {
  const out = new Array<R>(items.length);
  let next = 0;
  const lane = async () => {
    while (next < items.length) {
      if (signal.aborted) throw signal.reason;
      const i = next++;
      out[i] = await work(items[i]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(items.length, Math.max(1, lanes)) }, lane));
  return out;
}
