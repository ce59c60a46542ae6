import { endianness } from 'node:os';

/** True on the little-endian hosts Node runs on in practice (x64, arm64); typed arrays use host order. */
export const HOST_IS_LITTLE_ENDIAN = endianness() === 'LE';

type FloatArray = Float32Array | Float64Array;

/** Copies typed-array values into little-endian bytes (a plain copy on a little-endian host). */
export function toLittleEndian<A extends FloatArray>(
  values: A,
  width: number,
  set: (view: DataView, at: number, value: number) => void,
): Uint8Array {
  if (HOST_IS_LITTLE_ENDIAN) return new Uint8Array(values.buffer, values.byteOffset, values.byteLength).slice();
  const out = new Uint8Array(values.length * width);
  const view = new DataView(out.buffer);
  values.forEach((value, i) => set(view, i * width, value));
  return out;
}

/** Reads little-endian values: a view when aligned on a little-endian host, otherwise a copy. */
export function fromLittleEndian<A extends FloatArray>(
  bytes: Uint8Array,
  width: number,
  make: (buffer: ArrayBuffer, offset: number, length: number) => A,
  get: (view: DataView, at: number) => number,
): A {
  const length = bytes.byteLength / width;
  if (HOST_IS_LITTLE_ENDIAN) {
    if (bytes.byteOffset % width === 0 && bytes.buffer instanceof ArrayBuffer) {
      return make(bytes.buffer, bytes.byteOffset, length);
    }
    const copy = bytes.slice();
    return make(copy.buffer, 0, length);
  }
  const out = make(new ArrayBuffer(bytes.byteLength), 0, length);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = 0; i < length; i++) out[i] = get(view, i * width);
  return out;
}
