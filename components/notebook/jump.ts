// Scrolls a block into view and puts the keyboard focus on it (findings and presence link here).
export function jumpToBlock(blockId: string): void {
  const el = document.getElementById(`block-${blockId}`);
  if (!el) return;
  el.scrollIntoView({ behavior: "smooth", block: "start" });
  el.focus({ preventScroll: true });
}
