import { StoreError } from '../errors/KindredError.ts';
import { fromLittleEndian, toLittleEndian } from './littleEndian.ts';

/**
 * The bytes of a Float32Array in little-endian order (IEEE 754 binary32, 4 bytes a value), a copy.
 *
 * @example
 * float32ToBytes(new Float32Array([1])); // => Uint8Array [0, 0, 128, 63]
 */
export function float32ToBytes(values: Float32Array): Uint8Array {
  return toLittleEndian(values, 4, (view, at, value) => view.setFloat32(at, value, true));
}

/**
 * Float32 values from little-endian bytes. Shares memory with `bytes` when its offset is 4-aligned,
 * copies otherwise. A length that is not a multiple of 4 is a corrupt file.
 */
export function bytesToFloat32(bytes: Uint8Array): Float32Array {
  if (bytes.byteLength % 4 !== 0) {
    throw new StoreError('kindred.store.corrupt', `${bytes.byteLength} bytes are not a whole number of float32 values`, {
      bytes: bytes.byteLength,
    });
  }
  return fromLittleEndian(
    bytes,
    4,
    (buffer, offset, length) => new Float32Array(buffer, offset, length),
    (view, at) => view.getFloat32(at, true),
  );
}
