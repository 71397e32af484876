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
})();
