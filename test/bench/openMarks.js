// Injected before any script of each page load of the storage benchmark (`npm run bench:ui`):
// plain JavaScript, so that nothing of it is part of the app. Records, in performance.now()
// milliseconds from the navigation's start, the first contentful paint (the page's "Opening
// your designs…" line) and the frame after the first one that showed the editor with its chips.
window.__openMarks = {};
new PerformanceObserver((list) => {
  for (const e of list.getEntries()) window.__openMarks[e.name] = e.startTime;
}).observe({ type: 'paint', buffered: true });
const editorObserver = new MutationObserver(() => {
  if (document.querySelector('.rc-app .react-flow__node') === null) return;
  editorObserver.disconnect();
  // The first frame's callbacks run before the DOM is painted; the next frame starts after it.
  requestAnimationFrame(() =>
    requestAnimationFrame((t) => {
      window.__openMarks.editor = t;
    }),
  );
});
editorObserver.observe(document, { childList: true, subtree: true });
