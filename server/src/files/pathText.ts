/**
 * A file name that Node could give only as bytes, as text for a message: the parts that are
 * UTF-8 as they read, each byte that is not as `\xHH`, so no byte is lost or guessed at.
 */
import { isUtf8 } from "node:buffer";

/** `bytes` as text, with every byte outside a valid UTF-8 sequence written `\xHH`. */
export function bytesAsText(bytes: Uint8Array): string {
  let shown = "";
  let index = 0;
  while (index < bytes.length) {
    const length = sequenceLength(bytes[index]);
    const sequence = bytes.subarray(index, index + length);
    if (length > 0 && sequence.length === length && isUtf8(sequence)) {
      shown += Buffer.from(sequence).toString("utf8");
      index += length;
    } else {
      shown += `\\x${bytes[index].toString(16).padStart(2, "0")}`;
      index++;
    }
  }
  return shown;
}

/** Bytes in the UTF-8 sequence a lead byte starts; 0 for a byte that cannot start one. */
function sequenceLength(lead: number): number {
  if (lead < 0x80) return 1;
  if (lead >= 0xc2 && lead <= 0xdf) return 2;
  if (lead >= 0xe0 && lead <= 0xef) return 3;
  if (lead >= 0xf0 && lead <= 0xf4) return 4;
  return 0;
}
