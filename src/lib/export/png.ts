/**
 * Width and height of a PNG from its IHDR chunk (PNG spec, ISO/IEC 15948:2004 §11.2.2): the
 * 8-byte signature, then the IHDR chunk whose data starts with width and height as 32-bit
 * big-endian integers at bytes 16 and 20. Null when the bytes are not a PNG.
 */
export function pngSize(bytes: Uint8Array): { width: number; height: number } | null {
	const signature = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
	if (bytes.length < 24 || signature.some((b, i) => bytes[i] !== b)) return null;
	if (String.fromCharCode(...bytes.subarray(12, 16)) !== 'IHDR') return null;
	const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
	return { width: view.getUint32(16), height: view.getUint32(20) };
}
