/** A Map that keeps at most `capacity` entries, dropping the least recently used. */
export class BoundedCache<K, V> extends Map<K, V> {
  constructor(private readonly capacity: number) {
    super();
    if (!(capacity >= 1)) throw new RangeError(`capacity must be >= 1, got ${capacity}`);
  }

  override get(key: K): V | undefined {
    const value = super.get(key);
    if (value !== undefined) {
      super.delete(key);
      super.set(key, value);
    }
    return value;
  }

  override set(key: K, value: V): this {
    super.delete(key);
    super.set(key, value);
    while (this.size > this.capacity) super.delete(this.keys().next().value as K);
    return this;
  }
}
