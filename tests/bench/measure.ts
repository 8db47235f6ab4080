/** Median wall time in milliseconds of `runs` calls of `fn` after `warmup` calls. */
export async function medianMs(fn: () => unknown, runs = 50, warmup = 5): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const mid = Math.floor(times.length / 2);
  return times.length % 2 ? times[mid] : (times[mid - 1] + times[mid]) / 2;
}

/** Prints one benchmark line: label, measured figure, goal and whether it is met. */
export function report(label: string, ms: number, goalMs?: number): void {
  const goal = goalMs === undefined ? '' : `  goal < ${goalMs} ms  ${ms < goalMs ? 'met' : 'NOT MET'}`;
  console.log(`${label.padEnd(64)} ${ms.toFixed(3).padStart(10)} ms${goal}`);
}
