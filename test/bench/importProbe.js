// Injected before any script of each page of the import benchmark (`npm run bench:ui`): plain
// JavaScript, so that nothing of it is part of the app. Times are performance.now() ms.
//   start        the file input's change event (the import begins);
//   blocks       every long task (over 50 ms) the browser reports, with its start and duration;
//   lags         how late a 10 ms timer fired, each time: what an input event waits, at most;
//   choice       the frame after the first one showing the large-design choice;
//   openClicked  the press of "Open anyway"; opened: the frame after the first showing its chips.
window.__importMarks = { start: null, blocks: [], lags: [], choice: null, openClicked: null, opened: null };
const marks = window.__importMarks;
new PerformanceObserver((list) => {
  for (const e of list.getEntries()) marks.blocks.push({ at: e.startTime, ms: e.duration });
}).observe({ type: 'longtask', buffered: true });
document.addEventListener(
  'change',
  (e) => {
    if (e.target instanceof HTMLInputElement && e.target.type === 'file') marks.start = performance.now();
  },
  true,
);
document.addEventListener(
  'click',
  (e) => {
    if (e.target instanceof Element && e.target.closest('[data-testid="large-open"]') !== null)
      marks.openClicked = performance.now();
  },
  true,
);
let expected = performance.now() + 10;
const tick = () => {
  const now = performance.now();
  marks.lags.push({ at: now, ms: Math.max(0, now - expected) });
  expected = now + 10;
  setTimeout(tick, 10);
};
setTimeout(tick, 10);
const watch = () => {
  if (marks.choice === null && document.querySelector('[data-testid="large-design"]') !== null) {
    requestAnimationFrame(() =>
      requestAnimationFrame((t) => {
        marks.choice ??= t;
      }),
    );
  }
  if (
    marks.openClicked !== null &&
    marks.opened === null &&
    document.querySelector('[data-testid="large-design"]') === null &&
    document.querySelectorAll('.rc-app .react-flow__node').length > 0 &&
    document.querySelector('[data-testid="design-title"]')?.value === window.__importTitle
  ) {
    requestAnimationFrame(() =>
      requestAnimationFrame((t) => {
        marks.opened ??= t;
      }),
    );
  }
  requestAnimationFrame(watch);
};
requestAnimationFrame(watch);
