// Text for Leaflet tooltips, icons and controls as DOM nodes built with textContent: depot ids,
// names and refs come from the user's files, so they never go through Leaflet's HTML strings.

/** A span holding `text` as text (never parsed as HTML). */
export function textNode(text: string, className?: string): HTMLElement {
  const span = document.createElement('span');
  if (className) span.className = className;
  span.textContent = text;
  return span;
}
