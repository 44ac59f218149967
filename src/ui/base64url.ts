/**
 * UTF-8 text <-> base64url (RFC 4648 section 5: '-' and '_' instead of '+' and '/', no padding), so a
 * state fits in a URL fragment without escaping. Works in browsers and Node (btoa/atob, TextEncoder).
 */
export function textToBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = '';
  for (let i = 0; i < bytes.length; i += 0x8000) {
    binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  }
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

/** Inverse of textToBase64Url; throws a plain Error naming the problem on malformed input. */
export function base64UrlToText(encoded: string): string {
  if (!/^[A-Za-z0-9_-]*$/.test(encoded)) {
    throw new Error('the link data contains characters that are not base64url (A-Z, a-z, 0-9, -, _)');
  }
  if (encoded.length % 4 === 1) throw new Error('the link data has an impossible length (truncated?)');
  const padded = encoded.replace(/-/g, '+').replace(/_/g, '/') + '='.repeat((4 - (encoded.length % 4)) % 4);
  let binary: string;
  try {
    binary = atob(padded);
  } catch {
    // The browser's own wording (an InvalidCharacterError) is replaced by the rule broken.
    throw new Error('the link data is not valid base64url (damaged or cut short?)');
  }
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new Error('the link data does not decode to UTF-8 text (damaged or cut short?)');
  }
}
