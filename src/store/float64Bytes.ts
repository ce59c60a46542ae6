import { StoreError } from '../errors/KindredError.ts';
import { fromLittleEndian, toLittleEndian } from './littleEndian.ts';

/**
 * The bytes of a Float64Array in little-endian order (IEEE 754 binary64, 8 bytes a value), a copy.
 *
 * @example
 * float64ToBytes(new Float64Array([1])); // => Uint8Array [0, 0, 0, 0, 0, 0, 240, 63]
 */
export function float64ToBytes(values: Float64Array): Uint8Array {
  return toLittleEndian(values, 8, (view, at, value) => view.setFloat64(at, value, true));
}

/**
 * Float64 values from little-endian bytes. Shares memory with `bytes` when its offset is 8-aligned,
 * copies otherwise. A length that is not a multiple of 8 is a corrupt file.
 */
export function bytesToFloat64(bytes: Uint8Array): Float64Array {
  if (bytes.byteLength % 8 !== 0) {
    throw new StoreError('kindred.store.corrupt', `${bytes.byteLength} bytes are not a whole number of float64 values`, {
      bytes: bytes.byteLength,
    });
  }
  return fromLittleEndian(
    bytes,
    8,
    (buffer, offset, length) => new Float64Array(buffer, offset, length),
    (view, at) => view.getFloat64(at, true),
  );
}
