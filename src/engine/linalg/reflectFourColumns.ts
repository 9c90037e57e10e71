/**
 * Applies the reflector I − τvvᵀ to four adjacent columns at once: each pass over v feeds four
 * dot products, then four updates, which keeps the loads per multiply-add low enough for the loop
 * to run at arithmetic speed, and reads v half as often on tall columns.
 *
 * Column c (0–3) is data[target + c·stride + i] and v is v[vStart + i], for i in [0, length). When
 * `head` is given, v also has a leading 1 against the entries head.r[head.start + c] (the row of R
 * a streaming fold updates), which join the dot products and are updated with them.
 */
export function reflectFourColumns(
  v: Float64Array,
  vStart: number,
  data: Float64Array,
  target: number,
  stride: number,
  length: number,
  tau: number,
  head?: { r: Float64Array; start: number },
): void {
  const a = target;
  const b = a + stride;
  const c = b + stride;
  const d = c + stride;
  let s0 = head === undefined ? 0 : head.r[head.start];
  let s1 = head === undefined ? 0 : head.r[head.start + 1];
  let s2 = head === undefined ? 0 : head.r[head.start + 2];
  let s3 = head === undefined ? 0 : head.r[head.start + 3];
  for (let i = 0; i < length; i++) {
    const vi = v[vStart + i];
    s0 += vi * data[a + i];
    s1 += vi * data[b + i];
    s2 += vi * data[c + i];
    s3 += vi * data[d + i];
  }
  s0 *= tau;
  s1 *= tau;
  s2 *= tau;
  s3 *= tau;
  if (head !== undefined) {
    head.r[head.start] -= s0;
    head.r[head.start + 1] -= s1;
    head.r[head.start + 2] -= s2;
    head.r[head.start + 3] -= s3;
  }
  for (let i = 0; i < length; i++) {
    const vi = v[vStart + i];
    data[a + i] -= s0 * vi;
    data[b + i] -= s1 * vi;
    data[c + i] -= s2 * vi;
    data[d + i] -= s3 * vi;
  }
}
