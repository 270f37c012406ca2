// Server and schema messages are written lower-case so they read well inside other text;
// shown on their own they start with a capital.
export function sentence(text: string): string {
  return text.length > 0 ? text.charAt(0).toUpperCase() + text.slice(1) : text;
}
