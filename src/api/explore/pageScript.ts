/**
 * The explorer page's script, plain JavaScript run by the browser. It reads the page model from
 * `<script id="explore-data">`, lists the records (sortable), points at bonds and rings of the 2D picture, shows
 * the chosen figure (the exact bytes the CLI writes) with its table and command, and keeps the chosen bond or
 * ring when another record is chosen. It makes no network request; text goes into the page as text only (the
 * figures are conformark's own escaped SVG).
 */
export const PAGE_SCRIPT = String.raw`
(function () {
  'use strict';
  var data = JSON.parse(document.getElementById('explore-data').textContent);
  var rows = data.rows;
  var state = { row: 0, pick: null, flip: false, sort: { key: 'order', dir: 1 } };
  var ORDER = { key: 'order', get: function (r, i) { return i; } };
  var $ = function (id) { return document.getElementById(id); };
  var el = function (tag, text, cls) { var e = document.createElement(tag); if (text !== undefined && text !== null) e.textContent = String(text); if (cls) e.className = cls; return e; };
  var fixed = function (x, d) { return x === null || x === undefined ? '' : Number(x).toFixed(d); };
  var deg = function (x) { return x === null || x === undefined ? '—' : (x < 0 ? '\u2212' + Math.abs(x).toFixed(1) : x.toFixed(1)) + '\u00b0'; };

  var COLUMNS = [
    { key: 'record', label: 'record', num: true, get: function (r) { return r.record; } },
    { key: 'energy', label: 'E (kcal/mol)', num: true, ensemble: true, get: function (r) { return r.energy; }, show: function (r) { return fixed(r.energy, 2); } },
    { key: 'relativeEnergy', label: '\u0394E', num: true, ensemble: true, get: function (r) { return r.relativeEnergy; }, show: function (r) { return fixed(r.relativeEnergy, 2); } },
    { key: 'population', label: 'pop. %', num: true, ensemble: true, get: function (r) { return r.population; }, show: function (r) { return r.duplicateOf !== null ? 'dup. of ' + r.duplicateOf : fixed(r.population * 100, 1); } },
    { key: 'shapes', label: 'rings', get: function (r) { return r.shapes.join('; '); }, show: function (r) { return r.shapes.join('; ').replace(/-/g, '\u2011'); } }
  ].filter(function (c) { return !c.ensemble || data.ensemble; });

  function order() {
    var idx = rows.map(function (r, i) { return i; });
    var col = COLUMNS.filter(function (c) { return c.key === state.sort.key; })[0] || ORDER;
    idx.sort(function (a, b) {
      var x = col.get(rows[a], a), y = col.get(rows[b], b);
      var c = typeof x === 'number' && typeof y === 'number' ? x - y : String(x).localeCompare(String(y));
      return (c || a - b) * state.sort.dir;
    });
    return idx;
  }

  function renderRecords() {
    var head = $('record-head'); head.textContent = '';
    var tr = el('tr');
    COLUMNS.forEach(function (c) {
      var th = el('th', c.label, c.num ? 'num' : '');
      th.setAttribute('data-sort', c.key); th.tabIndex = 0; th.scope = 'col';
      if (c.key === state.sort.key) th.setAttribute('aria-sort', state.sort.dir > 0 ? 'ascending' : 'descending');
      tr.appendChild(th);
    });
    head.appendChild(tr);
    var body = $('record-body'); body.textContent = '';
    order().forEach(function (i) {
      var r = rows[i], row = el('tr', null, r.embedded ? '' : 'summarised');
      row.setAttribute('data-row', String(i)); row.tabIndex = 0; row.title = r.title;
      row.setAttribute('aria-selected', i === state.row ? 'true' : 'false');
      COLUMNS.forEach(function (c) {
        var td = el('td', c.show ? c.show(r) : c.get(r, i), (c.num ? 'num' : '') + (c.key === 'shapes' ? ' shapes' : ''));
        row.appendChild(td);
      });
      body.appendChild(row);
    });
  }

  function findPick(r) {
    if (!state.pick) return null;
    var list = state.pick.kind === 'bond' ? r.bonds : r.rings;
    return list.filter(function (x) { return x.key === state.pick.key; })[0] || null;
  }

  function renderPicture() {
    var r = rows[state.row];
    document.querySelectorAll('.depiction-box').forEach(function (box) { box.hidden = Number(box.getAttribute('data-depiction')) !== r.depiction; });
    var box = document.querySelector('.depiction-box[data-depiction="' + r.depiction + '"]');
    var bonds = {}, rings = {};
    r.bonds.forEach(function (b) { bonds[b.key] = b; });
    r.rings.forEach(function (g) { rings[g.key] = g; });
    box.querySelectorAll('.bond-hit').forEach(function (e) {
      var k = e.getAttribute('data-bond');
      e.classList.toggle('target', !!bonds[k]);
      e.classList.toggle('selected', !!state.pick && state.pick.kind === 'bond' && state.pick.key === k);
    });
    box.querySelectorAll('.ring-hit').forEach(function (e) {
      var k = e.getAttribute('data-ring');
      e.classList.toggle('target', !!rings[k]);
      e.classList.toggle('selected', !!state.pick && state.pick.kind === 'ring' && state.pick.key === k);
    });
    $('record-label').textContent = 'record ' + r.record + (r.title ? ' \u00b7 ' + r.title : '');
  }

  function currentFigure() {
    var item = findPick(rows[state.row]);
    if (!item) return null;
    if (state.pick.kind === 'bond') return item.views[state.flip ? 1 : 0] || null;
    return item.figure;
  }

  function tableRows() {
    var item = findPick(rows[state.row]);
    if (!item) return null;
    if (state.pick.kind === 'bond') {
      var fig = item.views[state.flip ? 1 : 0];
      var header = ['torsion', 'atoms', 'angle (deg)', 'Klyne\u2013Prelog', 'relation', '\u00b3J(H,H) (Hz)'];
      var body = item.torsions.map(function (t) {
        var atoms = state.flip ? [t.atoms[3], t.atoms[2], t.atoms[1], t.atoms[0]] : t.atoms;
        var label = state.flip ? t.label.split('\u2013').reverse().join('\u2013') : t.label;
        return [label, atoms.join('-'), fixed(t.angleDeg, 1), t.klynePrelog || '', t.relation || '', fixed(t.jHz, 1)];
      });
      return { caption: 'Torsions across ' + (fig ? fig.front + '\u2192' + fig.back : item.name), header: header, body: body, num: [2, 5] };
    }
    var head = [['shape', item.shape], ['descriptor', item.descriptor || ''], ['Q (\u00c5)', fixed(item.Q, 3)], ['theta (deg)', fixed(item.thetaDeg, 1)], ['phi (deg)', fixed(item.phiDeg, 1)]];
    return {
      caption: 'Substituents',
      header: ['ring atom', 'substituent', 'position', 'face', 'angle to normal (deg)'],
      body: item.substituents.map(function (s) { return [s.ringAtom, s.atom, s.position || '', s.face || '', fixed(s.angleToNormalDeg, 1)]; }),
      summary: head,
      num: [4]
    };
  }

  function renderFigure() {
    var r = rows[state.row], box = $('figure-box'), table = $('figure-table'), cmd = $('command');
    box.textContent = ''; table.textContent = ''; cmd.textContent = ''; $('figure-summary').textContent = '';
    var item = findPick(r), fig = currentFigure();
    $('flip').disabled = !(state.pick && state.pick.kind === 'bond' && fig);
    ['download-svg', 'download-png', 'copy-command'].forEach(function (id) { $(id).disabled = !fig; });
    $('copy-csv').disabled = !item;
    if (!state.pick) { $('figure-title').textContent = 'Choose a bond or a ring'; box.appendChild(el('p', 'Click a bond for its Newman projection, or a ring for its chair.')); return; }
    if (!r.embedded) { $('figure-title').textContent = state.pick.kind + ' ' + state.pick.key; box.appendChild(el('p', 'Record ' + r.record + ' is listed without figures (page size limit).')); return; }
    if (!item) { $('figure-title').textContent = state.pick.kind + ' ' + state.pick.key; box.appendChild(el('p', 'Record ' + r.record + ' has no such ' + state.pick.kind + ' to draw.')); return; }
    $('figure-title').textContent = state.pick.kind === 'bond' ? 'Newman projection ' + (fig ? fig.front + '\u2192' + fig.back : '') + ' (' + item.name + ')' : 'Ring ' + item.number + ': ' + item.name;
    if (fig) box.innerHTML = fig.svg; else box.appendChild(el('p', item.error || 'No figure.'));
    if (fig) cmd.textContent = fig.command;
    var t = tableRows();
    $('figure-summary').textContent = state.pick.kind === 'ring' ? ringLine(item) : bondLine(item);
    table.appendChild(el('caption', t.caption));
    var tr = el('tr');
    t.header.forEach(function (h) { tr.appendChild(el('th', h)); });
    table.appendChild(tr);
    t.body.forEach(function (cells) {
      var row = el('tr');
      cells.forEach(function (c, i) { row.appendChild(el('td', c, t.num.indexOf(i) >= 0 ? 'num' : '')); });
      table.appendChild(row);
    });
  }

  function render() {
    renderRecords(); renderPicture(); renderFigure();
    document.body.setAttribute('data-shown', String(rows[state.row].record));
  }

  // a record's bonds and rings are packed (gzip, base64) until it is first shown
  function unpack(i) {
    var r = rows[i];
    if (r.bonds) return Promise.resolve(r);
    if (!r.detail) { r.bonds = []; r.rings = []; return Promise.resolve(r); }
    if (typeof DecompressionStream === 'undefined') return Promise.reject(new Error('this browser cannot unpack the page (no DecompressionStream)'));
    var text = atob(r.detail), bytes = new Uint8Array(text.length);
    for (var k = 0; k < text.length; k++) bytes[k] = text.charCodeAt(k);
    var stream = new Blob([bytes]).stream().pipeThrough(new DecompressionStream('gzip'));
    return new Response(stream).text().then(function (json) {
      var d = JSON.parse(json);
      r.bonds = d.bonds; r.rings = d.rings; r.detail = null;
      return r;
    });
  }

  function failed(err) { say('could not show the record: ' + (err && err.message ? err.message : String(err))); }

  function csv(t) {
    var q = function (c) { c = String(c); return /[",\n]/.test(c) ? '"' + c.replace(/"/g, '""') + '"' : c; };
    var lines = (t.summary || []).map(function (p) { return [p[0], p[1]].map(q).join(','); });
    if (lines.length) lines.push('');
    lines.push(t.header.map(q).join(','));
    t.body.forEach(function (cells) { lines.push(cells.map(q).join(',')); });
    return lines.join('\n') + '\n';
  }

  function say(text) { $('status').textContent = text; }

  function copy(text, what) {
    var done = function () { say(what + ' copied'); };
    var fallback = function () {
      var area = document.createElement('textarea');
      area.value = text; document.body.appendChild(area); area.select();
      var ok = false;
      try { ok = document.execCommand('copy'); } catch (e) { ok = false; }
      area.remove();
      if (ok) done(); else say('copy failed: select the text and copy it by hand');
    };
    if (navigator.clipboard && navigator.clipboard.writeText) navigator.clipboard.writeText(text).then(done, fallback); else fallback();
  }

  function download(blob, name) {
    var url = URL.createObjectURL(blob), a = document.createElement('a');
    a.href = url; a.download = name; document.body.appendChild(a); a.click(); a.remove();
    setTimeout(function () { URL.revokeObjectURL(url); }, 1000);
    say(name + ' saved');
  }

  function downloadPng(fig) {
    var url = URL.createObjectURL(new Blob([fig.svg], { type: 'image/svg+xml' })), img = new Image();
    img.onload = function () {
      var scale = 4, canvas = document.createElement('canvas');
      canvas.width = Math.ceil(img.naturalWidth * scale); canvas.height = Math.ceil(img.naturalHeight * scale);
      var ctx = canvas.getContext('2d');
      ctx.fillStyle = '#ffffff'; ctx.fillRect(0, 0, canvas.width, canvas.height);
      ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
      URL.revokeObjectURL(url);
      canvas.toBlob(function (blob) { if (blob) download(blob, fig.file.replace(/\.svg$/, '.png')); });
    };
    img.onerror = function () { URL.revokeObjectURL(url); say('the browser could not draw the PNG; use the command with -o FILE.png'); };
    img.src = url;
  }

  function ringLine(g) {
    return g.shape + (g.descriptorText ? ' ' + g.descriptorText : '') + ' \u00b7 Q ' + fixed(g.Q, 3) + ' \u00c5' +
      (g.thetaDeg !== null ? ' \u00b7 \u03b8 ' + deg(g.thetaDeg) : '') + ' \u00b7 \u03c6 ' + deg(g.phiDeg);
  }

  function bondLine(b) {
    return b.name + ' (atoms ' + b.key + ')' + (b.conformation ? ' \u00b7 ' + b.conformation : '');
  }

  function tipText(kind, key) {
    var r = rows[state.row];
    if (!r.bonds) return null;
    var list = kind === 'bond' ? r.bonds : r.rings, item = list.filter(function (x) { return x.key === key; })[0];
    if (!item) return null;
    if (kind === 'ring') {
      return 'ring ' + item.number + ': ' + item.name + ' (atoms ' + item.atoms.join('-') + ')\n' + ringLine(item);
    }
    var heavy = item.torsions.filter(function (t) { return t.heavy; });
    var lines = (heavy.length ? heavy : item.torsions).map(function (t) { return t.label + '  ' + deg(t.angleDeg) + (t.klynePrelog ? ' (' + t.klynePrelog + ')' : ''); });
    return bondLine(item) + (lines.length ? '\n' + lines.join('\n') : '') + (item.error ? '\n' + item.error : '');
  }

  function targetOf(e) {
    var t = e.target;
    if (!t || !t.getAttribute) return null;
    if (t.classList.contains('bond-hit') && t.classList.contains('target')) return { kind: 'bond', key: t.getAttribute('data-bond'), node: t };
    if (t.classList.contains('ring-hit') && t.classList.contains('target')) return { kind: 'ring', key: t.getAttribute('data-ring'), node: t };
    return null;
  }

  function showTip(e) {
    var hit = targetOf(e), tip = $('tip');
    if (!hit) { tip.hidden = true; return; }
    var text = tipText(hit.kind, hit.key);
    if (!text) { tip.hidden = true; return; }
    tip.textContent = text; tip.hidden = false;
    var box = hit.node.getBoundingClientRect();
    var x = e.clientX !== undefined && e.type !== 'focusin' ? e.clientX : box.right;
    var y = e.clientY !== undefined && e.type !== 'focusin' ? e.clientY : box.bottom;
    tip.style.left = Math.min(x + 14, window.innerWidth - tip.offsetWidth - 8) + 'px';
    tip.style.top = Math.min(y + 14, window.innerHeight - tip.offsetHeight - 8) + 'px';
  }

  function choose(hit) {
    var same = state.pick && state.pick.kind === hit.kind && state.pick.key === hit.key;
    if (!same) state.flip = false;
    state.pick = { kind: hit.kind, key: hit.key };
    renderPicture(); renderFigure();
  }

  function chooseRow(i) {
    unpack(i).then(function () {
      state.row = i; render();
      var r = document.querySelector('#record-body tr[data-row="' + i + '"]'); if (r) r.focus();
    }, failed);
  }

  var pictures = $('pictures');
  pictures.addEventListener('mouseover', showTip);
  pictures.addEventListener('mousemove', showTip);
  pictures.addEventListener('focusin', showTip);
  pictures.addEventListener('mouseleave', function () { $('tip').hidden = true; });
  pictures.addEventListener('focusout', function () { $('tip').hidden = true; });
  pictures.addEventListener('click', function (e) { var hit = targetOf(e); if (hit) choose(hit); });
  pictures.addEventListener('keydown', function (e) { var hit = targetOf(e); if (hit && (e.key === 'Enter' || e.key === ' ')) { e.preventDefault(); choose(hit); } });

  $('record-head').addEventListener('click', function (e) {
    var th = e.target.closest('th'); if (!th) return;
    var key = th.getAttribute('data-sort');
    state.sort = { key: key, dir: state.sort.key === key ? -state.sort.dir : 1 };
    renderRecords();
  });
  $('record-head').addEventListener('keydown', function (e) { if (e.key === 'Enter') e.target.click(); });
  $('record-body').addEventListener('click', function (e) { var tr = e.target.closest('tr'); if (tr) chooseRow(Number(tr.getAttribute('data-row'))); });
  $('record-body').addEventListener('keydown', function (e) {
    var tr = e.target.closest('tr'); if (!tr) return;
    if (e.key === 'Enter' || e.key === ' ') { e.preventDefault(); chooseRow(Number(tr.getAttribute('data-row'))); }
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      var next = e.key === 'ArrowDown' ? tr.nextElementSibling : tr.previousElementSibling;
      if (next) chooseRow(Number(next.getAttribute('data-row')));
    }
  });

  $('flip').addEventListener('click', function () { state.flip = !state.flip; renderFigure(); });
  $('download-svg').addEventListener('click', function () { var f = currentFigure(); if (f) download(new Blob([f.svg], { type: 'image/svg+xml' }), f.file); });
  $('download-png').addEventListener('click', function () { var f = currentFigure(); if (f) downloadPng(f); });
  $('copy-csv').addEventListener('click', function () { var t = tableRows(); if (t) copy(csv(t), 'table (CSV)'); });
  $('copy-command').addEventListener('click', function () { var f = currentFigure(); if (f) copy(f.command, 'command'); });

  renderRecords();
  unpack(0).then(render, failed);
})();
`;
