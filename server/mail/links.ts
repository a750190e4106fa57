const LINK = /https?:\/\/[^\s<>"')]+/g;

/** The http(s) links in a message's text, in order, each once. */
export function linksIn(text: string): string[] {
  return [...new Set(text.match(LINK) ?? [])];
}
