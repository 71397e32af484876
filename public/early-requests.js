// Starts the first API reads of a page while its JavaScript (about 390 KB)
// is still downloading, instead of after it has run: the session always, and
// on /walks/<id> the walk and the walk screen's route chunk (its name is
// written in by scripts/build-web.sh; left alone, nothing is preloaded). hooks/early-requests.ts hands each answer to the
// first api() call for the same path; anything not taken within 30 s, or
// once any write has been sent, is never used. A separate file because the
// page's CSP forbids inline scripts. Keep the headers in step with
// hooks/api-client.ts, and keep this file plain ES5 (it is not compiled).
(function () {
  if (typeof fetch !== 'function') return;
  var paths = ['/auth/me'];
  var walk = /^\/walks\/(\d+)(\/report)?\/?$/.exec(location.pathname);
  if (walk) paths.push('/walks/' + walk[1]);
  var walkChunk = '__WALK_ROUTE_CHUNK__';
  // The report (/walks/<id>/report) reads the same walk but has a route chunk of its own.
  if (walk && !walk[2] && walkChunk.indexOf('/') === 0) {
    var link = document.createElement('link');
    link.rel = 'preload';
    link.as = 'script';
    link.href = walkChunk;
    document.head.appendChild(link);
  }
  var requests = {};
  for (var i = 0; i < paths.length; i++) {
    var pending = fetch('/api' + paths[i], {
      credentials: 'same-origin',
      headers: { Accept: 'application/json', 'X-Baywalk-Request': '1' },
    });
    // Taken later by api(), which reports a failure itself; never an unhandled rejection here.
    pending.catch(function () {});
    requests[paths[i]] = pending;
  }
  window.__baywalkEarly = { startedAt: Date.now(), requests: requests };

  // A page the server has drawn (the sign-in shell, a walk's step:
  // server/http/static-site.ts) names the app's scripts instead of loading them: they are fetched once
  // the drawing is on screen (its fonts in, one frame painted), so the
  // drawing never waits behind them. Inserted in order, run in order.
  var later = document.querySelectorAll('script[data-app-src]');
  if (later.length) {
    var loaded = false;
    var load = function () {
      if (loaded) return;
      loaded = true;
      for (var j = 0; j < later.length; j++) {
        var script = document.createElement('script');
        script.src = later[j].getAttribute('data-app-src');
        script.async = false;
        document.head.appendChild(script);
      }
    };
    var fontsIn = document.fonts && document.fonts.ready ? document.fonts.ready : Promise.resolve();
    fontsIn.then(function () {
      requestAnimationFrame(function () {
        setTimeout(load, 0);
      });
    });
    // A tab opened in the background paints no frames: load the app anyway.
    setTimeout(load, 3000);
  }
})();
