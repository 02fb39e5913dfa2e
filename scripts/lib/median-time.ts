// Benchmark timing shared by scripts/bench-*.ts: median wall time in ms of `repeat` runs after one
// warm-up run, rounded to 0.01 ms.
export function medianTime(run: () => void, repeat: number): number {
  run();
  const ms: number[] = [];
  for (let i = 0; i < repeat; i++) {
    const t0 = performance.now();
    run();
    ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  return Math.round(ms[Math.floor(ms.length / 2)] * 100) / 100;
}
