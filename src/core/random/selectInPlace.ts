// Floyd–Rivest selection (Floyd & Rivest 1975, Comm. ACM 18, 173, Algorithm 489), written from
// the published algorithm.

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i] as number;
  a[i] = a[j] as number;
  a[j] = t;
}

/**
 * Rearranges a[left..right] in place so that a[k] holds the value it would have if that range
 * were sorted, with a[left..k−1] ≤ a[k] ≤ a[k+1..right]. Expected O(right − left) time.
 * Values must not be NaN.
 */
export function selectInPlace(a: Float64Array, k: number, left = 0, right = a.length - 1): void {
  while (right > left) {
    // On large ranges, first select within a sample around k so the pivot lands next to it.
    if (right - left > 600) {
      const n = right - left + 1;
      const m = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (m - n / 2 < 0 ? -1 : 1);
      const newLeft = Math.max(left, Math.floor(k - (m * s) / n + sd));
      const newRight = Math.min(right, Math.floor(k + ((n - m) * s) / n + sd));
      selectInPlace(a, k, newLeft, newRight);
    }
    const t = a[k] as number;
    let i = left;
    let j = right;
    swap(a, left, k);
    if ((a[right] as number) > t) swap(a, left, right);
    while (i < j) {
      swap(a, i, j);
      i++;
      j--;
      while ((a[i] as number) < t) i++;
      while ((a[j] as number) > t) j--;
    }
    if (a[left] === t) swap(a, left, j);
    else {
      j++;
      swap(a, j, right);
    }
    if (j <= k) left = j + 1;
    if (k <= j) right = j - 1;
  }
}
