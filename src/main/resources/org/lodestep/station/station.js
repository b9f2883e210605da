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
  function follow(taskId, area, onEnd, onEvent) {
    var bar = area.querySelector('progress');
    var text = area.querySelector('.progress-text');
    area.hidden = false;
    area.classList.remove('failed');
    bar.removeAttribute('value');
    text.textContent = 'queued';
    var es = new EventSource('/api/tasks/' + encodeURIComponent(taskId) + '/events');
    es.addEventListener('task', function (m) {
      var e = JSON.parse(m.data);
      if (onEvent) { onEvent(e); }
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
      var data = new URLSearchParams(new FormData(form)); // the serial, and the typed readings when there are
      data.set('serial', serial);
      if (armKey) { data.set('arm', armKey); }
      if (armButton) { disarmed('Not armed: the arming was used by ' + serial + '.'); }
      form.reset();
      input.focus();
      post('/api/qa/runs/' + encodeURIComponent(run) + '/scan', data).then(function (j) {
        follow(j.task, area, function () { refresh(); });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
      });
    });

    if (form.dataset.typed === 'true') {
      // keyboard-first: Enter moves on to the next reading (a scanner's Enter after the serial too); the Enter
      // in the last field records the motor
      form.addEventListener('keydown', function (ev) {
        if (ev.key !== 'Enter' || ev.target.tagName !== 'INPUT') { return; }
        var inputs = Array.prototype.slice.call(form.querySelectorAll('input'));
        var i = inputs.indexOf(ev.target);
        if (i >= 0 && i < inputs.length - 1) {
          ev.preventDefault();
          inputs[i + 1].focus();
          inputs[i + 1].select();
        }
      });
    }

    panel.addEventListener('click', function (ev) {
      var b = ev.target.closest('button.retest');
      if (b) { input.value = b.dataset.serial; input.focus(); }
    });
  }

  // ---- a small line plot in inline SVG, drawn here (no charting library): the live response curve ----
  var SVG = 'http://www.w3.org/2000/svg';
  function el(name, attrs, text) {
    var e = document.createElementNS(SVG, name);
    for (var k in attrs) { if (Object.prototype.hasOwnProperty.call(attrs, k)) { e.setAttribute(k, attrs[k]); } }
    if (text !== undefined) { e.textContent = text; }
    return e;
  }
  function ticks(lo, hi, count) {
    var span = hi - lo, raw = span / count, mag = Math.pow(10, Math.floor(Math.log(raw) / Math.LN10)), step = mag;
    [1, 2, 5, 10].some(function (m) { step = m * mag; return step >= raw; });
    var out = [];
    for (var v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) { out.push(+v.toFixed(6)); }
    return out;
  }
  // data: {points: [[rate, dB]...], from, to, bands: [[from, to, peak]...], avoid: [[from, to]...]}
  function drawCurve(box, data) {
    // drawn at the box's own width, so the lettering keeps its size on a phone
    var W = Math.max(300, Math.round(box.clientWidth || 640)), H = W < 500 ? 240 : 280, L = 52, R = 12, T = 12, B = 40;
    var pts = data.points || [];
    var lo = Infinity, hi = -Infinity;
    pts.forEach(function (p) { lo = Math.min(lo, p[1]); hi = Math.max(hi, p[1]); });
    if (!isFinite(lo)) { lo = -40; hi = 0; }
    if (hi - lo < 6) { var mid = (hi + lo) / 2; lo = mid - 3; hi = mid + 3; }
    lo -= (hi - lo) * 0.08; hi += (hi - lo) * 0.08;
    var x0 = data.from, x1 = data.to;
    var x = function (r) { return L + (r - x0) / (x1 - x0) * (W - L - R); };
    var y = function (d) { return T + (hi - d) / (hi - lo) * (H - T - B); };
    var svg = el('svg', { viewBox: '0 0 ' + W + ' ' + H, role: 'img', class: 'plot',
      'aria-label': 'Vibration level against step rate, ' + pts.length + ' points' });
    (data.avoid || []).forEach(function (a) {
      svg.appendChild(el('rect', { x: x(Math.max(a[0], x0)), y: T, width: Math.max(1, x(Math.min(a[1], x1)) - x(Math.max(a[0], x0))),
        height: H - T - B, class: 'avoid' }));
    });
    (data.bands || []).forEach(function (b) {
      svg.appendChild(el('rect', { x: x(b[0]), y: T, width: Math.max(2, x(b[1]) - x(b[0])), height: H - T - B, class: 'band' }));
      svg.appendChild(el('text', { x: x(b[2]), y: T + 12, 'text-anchor': 'middle', class: 'band-label' }, '\u25B2 ' + Math.round(b[2])));
    });
    ticks(x0, x1, W < 500 ? 4 : 6).forEach(function (v) {
      svg.appendChild(el('line', { x1: x(v), x2: x(v), y1: T, y2: H - B, class: 'grid' }));
      svg.appendChild(el('text', { x: x(v), y: H - B + 16, 'text-anchor': 'middle' }, String(v)));
    });
    ticks(lo, hi, 5).forEach(function (v) {
      svg.appendChild(el('line', { x1: L, x2: W - R, y1: y(v), y2: y(v), class: 'grid' }));
      svg.appendChild(el('text', { x: L - 6, y: y(v) + 4, 'text-anchor': 'end' }, String(v)));
    });
    svg.appendChild(el('text', { x: (L + W - R) / 2, y: H - 6, 'text-anchor': 'middle' }, 'step rate, full steps/s'));
    svg.appendChild(el('text', { x: 12, y: (T + H - B) / 2, 'text-anchor': 'middle',
      transform: 'rotate(-90 12 ' + (T + H - B) / 2 + ')' }, 'level, dB'));
    svg.appendChild(el('rect', { x: L, y: T, width: W - L - R, height: H - T - B, class: 'frame' }));
    if (pts.length) {
      svg.appendChild(el('polyline', { points: pts.map(function (p) { return x(p[0]).toFixed(1) + ',' + y(p[1]).toFixed(1); }).join(' '),
        class: 'line' }));
    }
    box.replaceChildren(svg);
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
    var figure = document.getElementById('live-curve');
    var plotBox = document.getElementById('curve-plot');
    var state = document.getElementById('curve-state');
    function run(url, body, range) {
      start.disabled = true;
      result.innerHTML = '';
      delete result.dataset.bands;
      figure.hidden = true;
      figure.dataset.updates = '0';
      delete figure.dataset.points;
      post(url, body).then(function (j) {
        follow(j.task, area, function (e) {
          if (e.type === 'done') {
            var r = range || (e.points.length ? { from: e.points[0][0], to: e.points[e.points.length - 1][0] } : null);
            if (r && e.points.length) {
              figure.hidden = false;
              drawCurve(plotBox, { points: e.points, from: r.from, to: r.to, bands: e.band_spans, avoid: e.avoid_spans });
              figure.dataset.points = String(e.points.length);
              state.textContent = '\u2714 complete: ' + e.points.length + ' points, ' + e.bands + ' band'
                + (e.bands === 1 ? '' : 's') + ' (\u25B2 peak; shaded: band; outlined: rates to avoid)';
            }
            result.innerHTML = e.html; result.dataset.bands = String(e.bands);
          }
          sync();
        }, function (e) {
          if (e.type !== 'curve' || !range) { return; }
          if (figure.hidden) {
            figure.hidden = false;
            area.scrollIntoView({ block: 'start' }); // the engineer watches the curve, not the form
          }
          drawCurve(plotBox, { points: e.points, from: range.from, to: range.to });
          figure.dataset.updates = String(+figure.dataset.updates + 1);
          figure.dataset.points = String(e.points.length);
          state.textContent = '\u25CF live: ' + e.points.length + ' points, ' + e.captured_s.toFixed(1) + ' of '
            + e.sweep_s + ' s';
        });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
        sync();
      });
    }
    form.addEventListener('submit', function (ev) {
      ev.preventDefault();
      var from = parseFloat(document.getElementById('from').value), to = parseFloat(document.getElementById('to').value);
      run('/api/sweep', new URLSearchParams(new FormData(form)),
        isFinite(from) && isFinite(to) && to !== from ? { from: Math.min(from, to), to: Math.max(from, to) } : null);
    });
    result.addEventListener('submit', function (ev) {
      if (ev.target.id !== 'plan-form') { return; }
      ev.preventDefault();
      var planForm = ev.target, planArea = document.getElementById('plan-progress');
      var planResult = document.getElementById('plan-result');
      planResult.innerHTML = '';
      delete planResult.dataset.rows;
      post('/api/sweep/' + encodeURIComponent(planForm.dataset.sweep) + '/plan', new URLSearchParams(new FormData(planForm)))
        .then(function (j) {
          follow(j.task, planArea, function (e) {
            if (e.type === 'done') { planResult.innerHTML = e.html; planResult.dataset.rows = String(e.rows); }
          });
        }).catch(function (err) {
          planArea.hidden = false; planArea.classList.add('failed');
          planArea.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
        });
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

  // This page's own key: an arming is bound to the page that armed it, so another tab cannot fire it.
  var tabKey = Array.prototype.map.call(window.crypto.getRandomValues(new Uint8Array(16)), function (b) {
    return (b < 16 ? '0' : '') + b.toString(16);
  }).join('');

  // An energising rig action: caution shown, armed by an explicit click, fired once; each stage listed as it comes.
  function rigAction(section) {
    var armButton = section.querySelector('.arm-button');
    var armState = section.querySelector('.arm-state');
    var fire = section.querySelector('.fire');
    var area = section.querySelector('.progress');
    var list = section.querySelector('.rig-readings');
    var result = section.querySelector('.rig-result');
    var fields = section.querySelector('form.rig-fields');
    var armKey = null;
    function disarm(text) {
      armKey = null; fire.disabled = true;
      armState.textContent = text; armState.classList.remove('armed');
    }
    if (fields) { fields.addEventListener('submit', function (ev) { ev.preventDefault(); }); }
    armButton.addEventListener('click', function () {
      var data = new URLSearchParams();
      data.set('action', section.dataset.rigAction);
      data.set('tab', tabKey);
      post('/api/rig/arm', data).then(function (j) {
        armKey = j.arm; fire.disabled = false;
        armState.textContent = '\u25B2 ARMED for one run (valid ' + j.valid_s + ' s): hands off the leads while it runs.';
        armState.classList.add('armed');
        fire.focus();
      }).catch(function (err) { armState.textContent = '\u2716 ' + err.message; });
    });
    fire.addEventListener('click', function () {
      var data = fields ? new URLSearchParams(new FormData(fields)) : new URLSearchParams();
      data.set('arm', armKey || '');
      data.set('tab', tabKey);
      disarm('Not armed: the arming was used by this run.');
      list.replaceChildren();
      result.innerHTML = '';
      delete section.dataset.done;
      post(section.dataset.url, data).then(function (j) {
        follow(j.task, area, function (e) {
          if (e.type === 'done') { result.innerHTML = e.html; section.dataset.done = 'true'; }
          else { section.dataset.done = 'failed'; }
          area.scrollIntoView({ block: 'start' });
        }, function (e) {
          if (e.type !== 'reading' && e.type !== 'attention') { return; }
          var li = document.createElement('li');
          li.textContent = (e.type === 'attention' ? '\u25B2 ' : '') + e.text;
          if (e.type === 'attention') { li.className = 'attention'; }
          list.appendChild(li);
          section.dataset.readings = String(list.children.length);
        });
      }).catch(function (err) {
        area.hidden = false; area.classList.add('failed');
        area.querySelector('.progress-text').textContent = '\u2716 ' + err.message;
      });
    });
  }

  document.addEventListener('DOMContentLoaded', function () {
    Array.prototype.forEach.call(document.querySelectorAll('[data-rig-action]'), rigAction);
    if (document.getElementById('motor-form')) { motor(); }
    var probeRoot = document.querySelector('[data-page="leads-probe"]');
    if (probeRoot) { leadsProbe(probeRoot); }
    var root = document.querySelector('[data-page="qa-run"]');
    if (root) { qaRun(root); }
    if (document.getElementById('sweep-form')) { sweep(); }
  });
})();
