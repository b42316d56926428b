/** A growable list of x,y pairs, so tracing does not allocate per vertex. */
export class PointBuffer {
  data: Float64Array;
  length = 0;

  constructor(capacity = 256) {
    this.data = new Float64Array(2 * capacity);
  }

  push(x: number, y: number): void {
    if (2 * this.length + 2 > this.data.length) {
      const grown = new Float64Array(this.data.length * 2);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[2 * this.length] = x;
    this.data[2 * this.length + 1] = y;
    this.length++;
  }

  toArray(): Float64Array {
    return this.data.slice(0, 2 * this.length);
  }
}
