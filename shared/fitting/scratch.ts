// Reusable scratch buffers. Allocating a typed array costs far more than the arithmetic of a
// small fit, so the hot path borrows buffers from here instead. Each slot belongs to one
// function that never calls itself; the fitting code is synchronous, so slots are never shared
// by two calls at once.

const slots = new Map<string, Float64Array>();

/** A Float64Array of at least `size` entries (contents undefined) for the named slot. */
export function scratch(slot: string, size: number): Float64Array {
  let buf = slots.get(slot);
  if (!buf || buf.length < size) {
    buf = new Float64Array(Math.max(size, 2 * (buf?.length ?? 0), 64));
    slots.set(slot, buf);
  }
  return buf;
}
