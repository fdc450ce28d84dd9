// Content-Disposition for downloads: file names come from references people typed, so the plain
// `filename` is a safe ASCII fallback and `filename*` (RFC 6266 / RFC 5987) carries the real name.
const UNSAFE_IN_ANY_NAME = /[\u0000-\u001f\u007f"\\/:*?<>|]+/g;

/** The name with path separators, quotes and control characters replaced; never empty. */
export function safeFileName(name: string): string {
  const cleaned = name
    .replace(UNSAFE_IN_ANY_NAME, '-')
    .replace(/^[.\s-]+/, '')
    .trim();
  return cleaned.slice(0, 120) || 'download';
}

export function attachmentDisposition(name: string): string {
  const safe = safeFileName(name);
  const ascii = safe.replace(/[^A-Za-z0-9._ -]+/g, '_');
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeRFC5987(safe)}`;
}

function encodeRFC5987(value: string): string {
  return encodeURIComponent(value).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
}
