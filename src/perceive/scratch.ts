/**
 * Grow-only scratch arrays shared by the perception passes. Freshly mapped memory is expensive (every new
 * page faults on first touch, several µs each on a loaded machine), and a 100k-atom call needs megabytes of
 * temporary index arrays, so the buffers are kept between calls and only grow. Callers get a view of the
 * requested length whose contents are unspecified: they must fill it before reading. A view must not
 * outlive the call that took it, nor escape into a result, and one name may be in use once at a time.
 * Memory held: the largest request seen for each name, but only requests up to `KEEP_MAX` elements are kept
 * (about 150 bytes per atom up to ~1M-atom molecules, so at most a few tens of MB); larger ones are allocated
 * for the call and left to the garbage collector, so one huge file does not pin its memory for the process.
 */

/** Largest buffer (elements) kept between calls. */
const KEEP_MAX = 4_000_000;

const int32 = new Map<string, Int32Array>();
const float64 = new Map<string, Float64Array>();
const uint8 = new Map<string, Uint8Array>();

/** A scratch Int32Array view of `length` elements, contents unspecified. */
export function scratchInt32(name: string, length: number): Int32Array {
  let buffer = int32.get(name);
  if (length > KEEP_MAX) return new Int32Array(length);
  if (buffer === undefined || buffer.length < length) int32.set(name, (buffer = new Int32Array(grown(length))));
  return buffer.subarray(0, length);
}

/** A scratch Float64Array view of `length` elements, contents unspecified. */
export function scratchFloat64(name: string, length: number): Float64Array {
  let buffer = float64.get(name);
  if (length > KEEP_MAX) return new Float64Array(length);
  if (buffer === undefined || buffer.length < length) float64.set(name, (buffer = new Float64Array(grown(length))));
  return buffer.subarray(0, length);
}

/** A scratch Uint8Array view of `length` elements, contents unspecified. */
export function scratchUint8(name: string, length: number): Uint8Array {
  let buffer = uint8.get(name);
  if (length > KEEP_MAX) return new Uint8Array(length);
  if (buffer === undefined || buffer.length < length) uint8.set(name, (buffer = new Uint8Array(grown(length))));
  return buffer.subarray(0, length);
}

/** Room for a little growth, so slowly rising sizes do not reallocate every call. */
function grown(length: number): number {
  return Math.max(64, Math.ceil(length * 1.25));
}
