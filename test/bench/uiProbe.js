// Runs inside the page (`npm run bench:ui`): plain JavaScript, evaluated through the browser's
// debugging protocol, so that nothing of it is ever part of the app. Times are performance.now()
// milliseconds. The app exposes `window.__railcrossBench` ({ session, commands }) only with ?bench.
window.__probe = (() => {
  const bench = () => window.__railcrossBench;
  const frame = () => new Promise((r) => requestAnimationFrame(() => r(performance.now())));
  // A task posted after the store update runs once every microtask (all of React's synchronous work) is done.
  const drain = () =>
    new Promise((r) => {
      const ch = new MessageChannel();
      ch.port1.onmessage = () => r(performance.now());
      ch.port2.postMessage(0);
    });
  const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

  /** Every node React Flow renders is measured (visible), there are wires, and the view has been fitted. */
  function complete(parts) {
    const s = bench()?.session.editor.getState();
    if (s === undefined || s.design.parts.length !== parts) return null;
    const nodes = document.querySelectorAll('.react-flow__node');
    if (nodes.length === 0 || document.querySelectorAll('.react-flow__edge').length === 0) return null;
    for (const n of nodes) if (n.style.visibility === 'hidden') return null;
    const vp = document.querySelector('.react-flow__viewport')?.style.transform ?? '';
    if (vp === '' || vp === 'translate(0px, 0px) scale(1)') return null;
    return `${vp}|${nodes.length}`;
  }

  /** The time of the first animation frame after a frame that showed the whole design, unchanged since. */
  async function firstFullFrame(parts, deadline = 60000) {
    const start = performance.now();
    let last = null;
    while (performance.now() - start < deadline) {
      const t = await frame();
      const key = complete(parts);
      if (key !== null && key === last) return t;
      last = key;
    }
    throw new Error('the design never showed completely');
  }

  return {
    ready: () => bench() !== undefined && bench().session.editor !== undefined,

    /** Open a design as the library does (stored, then opened); ms to the first full frame. */
    async open(design) {
      const t0 = performance.now();
      await bench().session.createAndOpen(design);
      const t1 = await firstFullFrame(design.parts.length);
      return {
        ms: t1 - t0,
        nodes: document.querySelectorAll('.react-flow__node').length,
        edges: document.querySelectorAll('.react-flow__edge').length,
      };
    },

    /** After a reload: ms from the navigation's start to the first full frame. */
    async reloaded(parts) {
      const t1 = await firstFullFrame(parts);
      return { ms: t1, nodes: document.querySelectorAll('.react-flow__node').length };
    },

    view: () => ({
      transform: document.querySelector('.react-flow__viewport')?.style.transform,
      nodes: document.querySelectorAll('.react-flow__node').length,
      edges: document.querySelectorAll('.react-flow__edge').length,
      elements: document.querySelectorAll('*').length,
    }),

    /** `n` profile switches of `part` between two families, each turning `net` red or back. */
    async recolour(n, part, families, net) {
      const store = bench().session.editor;
      const { setPartProfile } = bench().commands;
      const out = { check: [], commit: [], paint: [], missed: 0 };
      // The wire's element, looked up again only when React replaced it: a query per frame would be timed too.
      let el = null;
      const wire = () => (el?.isConnected ? el : (el = document.querySelector(`.rc-wire[data-net="${net}"]`)));
      for (let k = 0; k < n; k++) {
        await sleep(24 + (k % 6) * 3);
        const before = wire()?.getAttribute('data-severity');
        const t0 = performance.now();
        store.getState().apply(setPartProfile(part, families[(k + 1) % 2]));
        const t1 = performance.now();
        const t2 = await drain();
        let painted = null;
        for (let f = 0; f < 60 && painted === null; f++) {
          await frame();
          const now = wire()?.getAttribute('data-severity');
          // The frame whose callbacks saw the new colour is painted before the next one starts.
          if (now !== undefined && now !== before) painted = await frame();
        }
        if (painted === null) out.missed++;
        out.check.push(t1 - t0);
        out.commit.push(t2 - t1);
        out.paint.push((painted ?? NaN) - t0);
      }
      return out;
    },

    /** `n` steps of a drag of `part` by its header, with the mouse events React Flow listens to. */
    async drag(n, part) {
      let el = null;
      const node = () => (el?.isConnected ? el : (el = document.querySelector(`.react-flow__node[data-id="${part}"]`)));
      const head = node().querySelector('.rc-chip-head');
      const r = head.getBoundingClientRect();
      let x = r.left + 20;
      const y = r.top + 8;
      const ev = (type, target, buttons) =>
        target.dispatchEvent(
          new MouseEvent(type, {
            bubbles: true,
            cancelable: true,
            view: window,
            clientX: x,
            clientY: y,
            button: 0,
            buttons,
          }),
        );
      ev('mousedown', head, 1);
      x += 6;
      ev('mousemove', document, 1);
      await frame();
      await frame();
      const out = { paint: [], missed: 0 };
      const zoom = Number(
        /scale\(([^)]+)\)/.exec(document.querySelector('.react-flow__viewport').style.transform)?.[1] ?? 1,
      );
      // A little over one grid step (snap grid 10) on screen, so that every step moves the chip;
      // back and forth, so that it stays in view.
      const step = Math.max(1, Math.ceil(10 * zoom * 1.2));
      for (let k = 0; k < n; k++) {
        await sleep(24 + (k % 6) * 3);
        const before = node().style.transform;
        x += Math.floor(k / 10) % 2 === 0 ? step : -step;
        const t0 = performance.now();
        ev('mousemove', document, 1);
        let painted = null;
        for (let f = 0; f < 60 && painted === null; f++) {
          await frame();
          if (node()?.style.transform !== before) painted = await frame();
        }
        if (painted === null) out.missed++;
        out.paint.push((painted ?? NaN) - t0);
      }
      ev('mouseup', document, 0);
      await frame();
      return out;
    },

    /** Store `design` as a new design of the library and open it; resolves once its bookkeeping is stored. */
    async store(design) {
      const { session } = bench();
      await session.createAndOpen(design);
      await session.settled;
      await firstFullFrame(design.parts.length);
      return session.openId;
    },

    /**
     * `n` saves of the open design as autosave makes them (a rename, then the saver's write:
     * one `Library.save` transaction each), timed by the app's own `railcross:save` measure.
     */
    async saves(n) {
      const { session, commands } = bench();
      const title = session.editor.getState().design.title;
      performance.clearMeasures('railcross:save');
      for (let k = 0; k < n; k++) {
        await sleep(100);
        session.editor.getState().apply(commands.setTitle(`${title}, edit ${k + 1}`));
        await session.flush();
      }
      const status = session.state.getState().open.saver.status;
      if (status.state !== 'saved') throw new Error(`autosave ended ${status.state}: ${status.error ?? ''}`);
      return performance.getEntriesByName('railcross:save').map((e) => e.duration);
    },

    undo: () => bench().session.editor.getState().undo(),
    pastNames: () =>
      bench()
        .session.editor.getState()
        .past.map((s) => s.name),
  };
})();
