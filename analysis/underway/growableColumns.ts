/**
 * Growable typed arrays for reading a log of unknown length: capacity doubles as rows arrive and
 * the arrays are trimmed (copied once) at the end.
 */

/** A Float64Array that grows by doubling. */
export class GrowableFloat64 {
  data: Float64Array;
  length = 0;
  constructor(capacity = 4096) {
    this.data = new Float64Array(Math.max(16, capacity));
  }
  push(x: number): void {
    if (this.length === this.data.length) {
      const next = new Float64Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = x;
  }
  /** The values as an exactly sized array. */
  trimmed(): Float64Array {
    return this.data.slice(0, this.length);
  }
}

/** A Uint8Array that grows by doubling. */
export class GrowableUint8 {
  data: Uint8Array;
  length = 0;
  constructor(capacity = 4096) {
    this.data = new Uint8Array(Math.max(16, capacity));
  }
  push(x: number): void {
    if (this.length === this.data.length) {
      const next = new Uint8Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = x;
  }
  trimmed(): Uint8Array {
    return this.data.slice(0, this.length);
  }
}

/** A Uint32Array that grows by doubling. */
export class GrowableUint32 {
  data: Uint32Array;
  length = 0;
  constructor(capacity = 4096) {
    this.data = new Uint32Array(Math.max(16, capacity));
  }
  push(x: number): void {
    if (this.length === this.data.length) {
      const next = new Uint32Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = x;
  }
  trimmed(): Uint32Array {
    return this.data.slice(0, this.length);
  }
}
