/** Text and attribute values for XML: the five predefined entities, and no control characters XML 1.0 forbids. */
export function escapeXml(s: string): string {
  return (
    s
      // biome-ignore lint/suspicious/noControlCharactersInRegex: removing the characters XML 1.0 does not allow
      .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f]/g, "")
      .replace(/&/g, "&amp;")
      .replace(/</g, "&lt;")
      .replace(/>/g, "&gt;")
      .replace(/"/g, "&quot;")
      .replace(/'/g, "&apos;")
  );
}

export const XML_DECLARATION = '<?xml version="1.0" encoding="UTF-8"?>';
