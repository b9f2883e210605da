// Lodestep bench station: the pages' own script (no third-party code). Every markup it inserts comes from the
// station, already escaped; text from events goes in through textContent.
(function () {
  'use strict';
  var formKey = (document.querySelector('meta[name="lodestep-form"]') || {}).content || '';

  function post(url, data) {
    return fetch(url, {
      method: 'POST', body: data, credentials: 'same-origin',
      headers: { 'X-Lodestep-Form': formKey }
    }).then(function (r) {
      return r.json().then(function (j) {
        if (!r.ok) { throw new Error(j.message || ('HTTP ' + r.status)); }
        return j;
      });
    });
  }

  // Follows a task's events: progress bar and step text while it runs, then onEnd(lastEvent).
  function follow(taskId, area, onEnd) {
    var bar = area.querySelector('progress');
    var text = area.querySelector('.progress-text');
    area.hidden = false;
    area.classList.remove('failed');
    bar.removeAttribute('value');
    text.textContent = 'queued';
    var es = new EventSource('/api/tasks/' + encodeURIComponent(taskId) + '/events');
    es.addEventListener('task', function (m) {
      var e = JSON.parse(m.data);
      if (e.type === 'step') { text.textContent = e.text; }
      else if (e.type === 'note') { text.textContent = e.text; }
      else if (e.type === 'progress') {
        if (e.total > 0) { bar.max = e.total; bar.value = e.done; } else { bar.removeAttribute('value'); }
      } else if (e.type === 'done' || e.type === 'failed') {
        es.close();
        bar.max = 1; bar.value = 1;
        if (e.type === 'failed') {
          area.classList.add('failed');
          text.textContent = '\u2716 ' + e.message;
        } else {
          text.textContent = '\u2714 done';
        }
        onEnd(e);
      }
    });
    es.onerror = function () {
      if (es.readyState === EventSource.CLOSED) {
        area.classList.add('failed');
        text.textContent = '\u2716 lost contact with the station; reload the page';
      }
    };
  }

  // Speaks the new content through the page's persistent live region (inserted regions are often not announced).
  function announce(el) {
    var region = document.getElementById('announce');
    if (region && el) { region.textContent = (el.innerText || el.textContent).replace(/\s+/g, ' ').trim(); }
  }

  function qaRun(root) {
    var run = root.dataset.run;
    var form = document.getElementById('scan-form');
    var input = document.getElementById('serial');
    var area = document.getElementById('scan-progress');
    var panel = document.getElementById('panel');
    var armButton = document.getElementById('arm');
    var armState = document.getElementById('arm-state');
    var armKey = null;

    function refresh() {
      return fetch('/qa/runs/' + encodeURIComponent(run) + '/panel', { credentials: 'same-origin' })
        .then(function (r) { return r.text(); })
        .then(function (html) {
          panel.innerHTML = html;
          announce(panel.querySelector('#verdict'));
          root.dataset.scans = String((+root.dataset.scans || 0) + 1);
        });
    }

    function disarmed(text) {
      armKey = null;
      if (armState) { armState.textContent = text; armState.classList.remove('armed'); }
    }

    if (armButton) {
      armButton.addEventListener('click', function () {
        post('/api/qa/runs/' + encodeURIComponent(run) + '/arm', new URLSearchParams()).then(function (j) {
          armKey = j.arm;
          armState.textContent = '\u25B2 ARMED for the next motor: ' + j.volts + ' V DC (valid ' + j.valid_s + ' s). '
            + 'Hands off the leads and the frame.';
          armState.classList.add('armed');
          input.focus();
        }).catch(function (err) { armState.textContent = '\u2716 ' + err.message; });
      });
    }

    form.addEventListener('submit', function (ev) {
      ev.preventDefault();
      var serial = input.value.trim();
      if (!serial) { return; }
      var data = new URLSearchParams();
      data.set('serial', serial);
      if (armKey) { data.set('arm', armKey); }
      if (armButton) { disarmed('Not armed: the arming was used by ' + serial + '.'); }
      input.value = '';
      input.focus();
      post('/api/qa/runs/' + encodeURIComponent(run) + '/scan', data).then(function (j) {
        follow(j.task, area, function () { refresh(); });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
      });
    });

    panel.addEventListener('click', function (ev) {
      var b = ev.target.closest('button.retest');
      if (b) { input.value = b.dataset.serial; input.focus(); }
    });
  }

  function sweep() {
    var form = document.getElementById('sweep-form');
    var ack = document.getElementById('ack');
    var start = document.getElementById('sweep-start');
    var area = document.getElementById('sweep-progress');
    var result = document.getElementById('sweep-result');
    function sync() { start.disabled = !ack.checked; }
    ack.addEventListener('change', sync);
    sync();
    function run(url, body) {
      start.disabled = true;
      result.innerHTML = '';
      delete result.dataset.bands;
      post(url, body).then(function (j) {
        follow(j.task, area, function (e) {
          if (e.type === 'done') { result.innerHTML = e.html; result.dataset.bands = String(e.bands); }
          sync();
        });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
        sync();
      });
    }
    form.addEventListener('submit', function (ev) {
      ev.preventDefault();
      run('/api/sweep', new URLSearchParams(new FormData(form)));
    });
    var upload = document.getElementById('upload-form');
    upload.addEventListener('submit', function (ev) {
      ev.preventDefault();
      run('/api/sweep/upload', new FormData(upload));
    });
  }

  function leadsProbe(root) {
    var probe = root.dataset.probe;
    var panel = document.getElementById('probe-panel');
    var status = document.createElement('p');
    status.className = 'problem';
    status.setAttribute('role', 'alert');
    status.hidden = true;
    root.insertBefore(status, panel);

    function send(value) {
      var data = new URLSearchParams();
      data.set('value', value);
      post('/api/leads/probes/' + encodeURIComponent(probe) + '/answer', data).then(function (j) {
        status.hidden = true;
        panel.innerHTML = j.html;
        announce(panel.querySelector('#next'));
        root.dataset.answers = String((+root.dataset.answers || 0) + 1);
        if (j.done) { root.dataset.done = 'true'; }
        var input = document.getElementById('ohms');
        if (input) { input.focus(); }
      }).catch(function (err) {
        status.hidden = false;
        status.textContent = '\u2716 ' + err.message;
        var input = document.getElementById('ohms');
        if (input) { input.select(); input.focus(); }
      });
    }

    panel.addEventListener('submit', function (ev) {
      if (ev.target.id !== 'answer-form') { return; }
      ev.preventDefault();
      var input = document.getElementById('ohms');
      if (input.value.trim()) { send(input.value.trim()); }
    });
    panel.addEventListener('click', function (ev) {
      var b = ev.target.closest('button[data-value]');
      if (b) { send(b.dataset.value); }
    });
  }

  function motor() {
    var form = document.getElementById('motor-form');
    var area = document.getElementById('motor-progress');
    var result = document.getElementById('motor-result');
    form.addEventListener('submit', function (ev) {
      ev.preventDefault();
      result.innerHTML = '';
      delete result.dataset.done;
      post('/api/motor', new FormData(form)).then(function (j) {
        follow(j.task, area, function (e) {
          if (e.type === 'done') { result.innerHTML = e.html; result.dataset.done = 'true'; }
        });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
      });
    });
  }

  document.addEventListener('DOMContentLoaded', function () {
    if (document.getElementById('motor-form')) { motor(); }
    var probeRoot = document.querySelector('[data-page="leads-probe"]');
    if (probeRoot) { leadsProbe(probeRoot); }
    var root = document.querySelector('[data-page="qa-run"]');
    if (root) { qaRun(root); }
    if (document.getElementById('sweep-form')) { sweep(); }
  });
})();
