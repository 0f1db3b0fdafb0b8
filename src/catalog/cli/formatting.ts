/** An integer with thousands separators: 100000 → "100,000". */
export function formatCount(n: number): string {
  return Math.round(n).toLocaleString('en-US');
}

/** A duration for people: "0.8 s", "42 s", "3 min 05 s", "1 h 02 min". */
export function formatDuration(ms: number): string {
  const s = ms / 1000;
  if (s < 10) return `${s.toFixed(1)} s`;
  if (s < 60) return `${Math.round(s)} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${String(Math.round(s - m * 60)).padStart(2, '0')} s`;
  const h = Math.floor(m / 60);
  return `${h} h ${String(m - h * 60).padStart(2, '0')} min`;
}
