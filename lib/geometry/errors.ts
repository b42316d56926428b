/** A failure of the geometry engine on a valid-looking design, with where it happened. */
export class GeometryError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'GeometryError';
  }
}
