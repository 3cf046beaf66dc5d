// Plumbline workbench: the page's code. Plain browser code, no libraries; everything it
// asks goes to the workbench on 127.0.0.1 with the access key from the page's address.
'use strict';

const KEY = new URLSearchParams(location.search).get('k') || '';
const $ = id => document.getElementById(id);
const SVG = 'http://www.w3.org/2000/svg';

const state = {
  outline: null,      // the model text's values with their lines and columns
  view: null,         // the last model that read without problems, for the drawing
  viewIsCurrent: false,
  picked: null,       // {kind: 'member'|'node', name}
  run: null,          // the last check's answer
  results: null,      // the last check's results JSON
  claimsMode: 'table' // 'table' (CSV rows) or 'text' (a YAML or JSON claims file)
};

// ---------- talking to the workbench ----------

async function api(method, path, body) {
  const res = await fetch(path, {
    method,
    headers: Object.assign({'X-Plumbline-Key': KEY}, body ? {'Content-Type': 'application/json'} : {}),
    body: body ? JSON.stringify(body) : undefined
  });
  const data = await res.json().catch(() => ({error: 'the workbench gave no answer (' + res.status + ')'}));
  if (!res.ok) throw Object.assign(new Error(data.error || res.statusText), {status: res.status});
  return data;
}

function withKey(path) {
  return path + (path.includes('?') ? '&' : '?') + 'k=' + encodeURIComponent(KEY);
}

function say(text, bad) {
  const s = $('status');
  s.textContent = text;
  s.className = bad ? 'bad' : '';
}

function el(tag, attrs, ...children) {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs || {})) {
    if (k === 'class') e.className = v; else if (k.startsWith('on')) e.addEventListener(k.slice(2), v); else e.setAttribute(k, v);
  }
  for (const c of children) if (c != null) e.append(c);
  return e;
}

// ---------- tabs ----------

document.querySelectorAll('nav.tabs').forEach(nav => {
  nav.addEventListener('click', ev => {
    const b = ev.target.closest('button');
    if (b) showTab(nav.dataset.group, b.dataset.tab);
  });
});

function showTab(group, tab) {
  document.querySelectorAll(`nav[data-group="${group}"] button`).forEach(b => b.classList.toggle('on', b.dataset.tab === tab));
  document.querySelectorAll(`.tab[data-group="${group}"]`).forEach(t => t.classList.toggle('on', t.dataset.tab === tab));
}

// ---------- the model text and its messages ----------

const text = $('model-text');
let validateTimer = null;

// Until the changed text has been read, no message about the earlier text stands
function markPending() {
  const list = $('messages');
  list.textContent = '';
  list.append(el('li', {class: 'fine pending'}, 'Reading the model…'));
}

text.addEventListener('input', () => {
  markPending();
  drawGutter([]);
  clearTimeout(validateTimer);
  validateTimer = setTimeout(validate, 300);
});
text.addEventListener('scroll', () => { $('gutter').scrollTop = text.scrollTop; });
text.addEventListener('keydown', ev => {
  if (ev.key === 'Tab') { // YAML indents with spaces
    ev.preventDefault();
    text.setRangeText('  ', text.selectionStart, text.selectionEnd, 'end');
    text.dispatchEvent(new Event('input'));
  }
});

function drawGutter(badLines) {
  const n = text.value.split('\n').length;
  const bad = new Set(badLines);
  const g = $('gutter');
  g.textContent = '';
  for (let i = 1; i <= n; i++) {
    const line = el('div', bad.has(i) ? {class: 'bad', title: 'a problem on this line'} : {}, String(i));
    g.append(line);
  }
  g.scrollTop = text.scrollTop;
}

function goToLine(line) {
  const lines = text.value.split('\n');
  let start = 0;
  for (let i = 0; i < line - 1 && i < lines.length; i++) start += lines[i].length + 1;
  showTab('model', 'text');
  text.focus();
  text.setSelectionRange(start, start + (lines[line - 1] || '').length);
  text.scrollTop = Math.max(0, (line - 4) * 18);
}

let validating = 0;
async function validate() {
  const ticket = ++validating;
  let answer;
  try {
    answer = await api('POST', '/api/model', {name: $('model-name').value, text: text.value});
  } catch (e) {
    say(e.message, true);
    return;
  }
  if (ticket !== validating) return; // a later edit is being read
  const list = $('messages');
  list.textContent = '';
  for (const p of answer.problems) {
    const li = el('li', {title: 'go to line ' + p.line}, (p.line ? 'line ' + p.line + ': ' : '') + p.field + ': ' + p.message);
    li.dataset.line = p.line;
    li.addEventListener('click', () => p.line && goToLine(p.line));
    list.append(li);
  }
  if (!answer.problems.length) list.append(el('li', {class: 'fine'}, 'The model reads without problems.'));
  drawGutter(answer.problems.map(p => p.line));
  if (answer.outline) state.outline = answer.outline;
  if (answer.view) state.view = answer.view;
  state.viewIsCurrent = !!answer.view;
  renderTables();
  fillLoadCases();
  draw();
}

// ---------- editing the text in place (tables and the inspector) ----------

function lineStarts(t) {
  const starts = [0];
  for (let i = 0; i < t.length; i++) if (t[i] === '\n') starts.push(i + 1);
  return starts;
}

function offsetOf(t, line, col) {
  return lineStarts(t)[line - 1] + col - 1;
}

// Where the value written at an offset ends: a quoted value at its closing quote; in a flow
// collection ({...} or [...]) at the next ',', '}' or ']'; in a block at the line's end or a comment.
function valueEnd(t, start) {
  const q = t[start];
  if (q === '"' || q === "'") {
    for (let i = start + 1; i < t.length; i++) {
      if (q === "'" && t[i] === "'" && t[i + 1] === "'") { i++; continue; }
      if (q === '"' && t[i] === '\\') { i++; continue; }
      if (t[i] === q) return i + 1;
    }
    return t.length;
  }
  const lineStart = t.lastIndexOf('\n', start - 1) + 1;
  let depth = 0;
  for (let i = lineStart; i < start; i++) {
    if (t[i] === '{' || t[i] === '[') depth++;
    else if (t[i] === '}' || t[i] === ']') depth--;
  }
  let i = start;
  for (; i < t.length && t[i] !== '\n'; i++) {
    if (depth > 0 && (t[i] === ',' || t[i] === '}' || t[i] === ']')) break;
    if (t[i] === '#' && /\s/.test(t[i - 1])) break;
  }
  while (i > start && /\s/.test(t[i - 1])) i--;
  return i;
}

function isJson() {
  return /\.json$/i.test($('model-name').value.trim());
}

// A value as the model's text writes it. JSON: a number plain, anything else (a name, a key)
// as a JSON string. YAML: plain when it reads back as itself, else in single quotes.
function yamlValue(v, key) {
  const s = String(v).trim();
  if (isJson()) return !key && /^-?(0|[1-9]\d*)(\.\d+)?([eE][-+]?\d+)?$/.test(s) ? s : JSON.stringify(s);
  if (s === '') return "''";
  if (/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(s)) return s;
  if (/^[A-Za-z0-9_.%+\-*/^ ()]+$/.test(s) && !/^[-?]/.test(s) && !/^(true|false|null|yes|no|on|off|~)$/i.test(s)) return s;
  return "'" + s.replace(/'/g, "''") + "'";
}

function setText(t, note) {
  markPending();
  const top = text.scrollTop;
  text.value = t;
  text.scrollTop = top;
  drawGutter([]);
  say(note || 'Model edited');
  validate();
}

function replaceValue(node, value, key) {
  const t = text.value;
  const start = offsetOf(t, node.line, node.col);
  const end = valueEnd(t, start);
  // the table was drawn from the text as it was read; if the text has changed there since, edit nothing
  const written = t.slice(start, end).replace(/^(['"])([\s\S]*)\1$/, '$2');
  if (node.text !== undefined && written !== node.text && written.replace(/''/g, "'") !== node.text) {
    say('The text changed under this table; nothing was edited. Try again.', true);
    validate();
    return;
  }
  setText(t.slice(0, start) + yamlValue(value, key) + t.slice(end));
}

// Adds `key: value` to a map row: inside its braces when written {...}, else as a line under it.
function addField(mapNode, key, value) {
  if (isJson()) { say('In a JSON model, add fields in the text; the tables change values only', true); return; }
  const t = text.value;
  const start = offsetOf(t, mapNode.line, mapNode.col);
  const pair = key + ': ' + yamlValue(value);
  if (t[start] === '{') {
    let depth = 0, i = start;
    for (; i < t.length; i++) {
      if (t[i] === '{' || t[i] === '[') depth++;
      else if (t[i] === '}' || t[i] === ']') { depth--; if (depth === 0) break; }
    }
    const inside = t.slice(start + 1, i).trim();
    setText(t.slice(0, i).replace(/\s*$/, '') + (inside ? ', ' : '') + pair + t.slice(i));
  } else if (mapNode.entries && mapNode.entries.length) {
    const last = lastLine(mapNode);
    const starts = lineStarts(t);
    const at = last < starts.length ? starts[last] : t.length;
    const indent = ' '.repeat(mapNode.entries[0].col - 1);
    setText(t.slice(0, at) + indent + pair + '\n' + t.slice(at));
  }
}

function lastLine(node) {
  let l = node.line;
  for (const e of node.entries || []) l = Math.max(l, e.line, lastLine(e.value));
  for (const it of node.items || []) l = Math.max(l, lastLine(it));
  return l;
}

// Removes the lines a row is written on, when no other row shares them.
function removeRow(firstLine, lastLineNo, siblings) {
  if (isJson()) { say('In a JSON model, remove rows in the text; the tables change values only', true); return; }
  for (const s of siblings) {
    if (s.first !== firstLine && s.first <= lastLineNo && s.last >= firstLine) {
      say('This row shares its line with another; delete it in the text', true);
      return;
    }
  }
  const lines = text.value.split('\n');
  lines.splice(firstLine - 1, lastLineNo - firstLine + 1);
  setText(lines.join('\n'), 'Row removed');
}

function insertLineAfter(line, content) {
  if (isJson()) { say('In a JSON model, add rows in the text; the tables change values only', true); return; }
  const lines = text.value.split('\n');
  lines.splice(line, 0, content);
  setText(lines.join('\n'), 'Row added');
}

function topEntry(key) {
  return state.outline && state.outline.entries ? state.outline.entries.find(e => e.key === key) : null;
}

// ---------- the tables ----------

// Each section's columns; a row's value is a map (fields), a list (by position) or one value.
const SECTIONS = [
  {key: 'nodes', title: 'Nodes', columns: ['x', 'y'], list: true, blank: r => `[${r.x || 0}, ${r.y || 0}]`},
  {key: 'supports', title: 'Supports', columns: ['type', 'fix', 'angle', 'springs'], single: 'type'},
  {key: 'members', title: 'Members', columns: ['from', 'to', 'section', 'hinge', 'truss']},
  {key: 'sections', title: 'Sections', columns: ['A', 'I', 'depth', 'material']},
  {key: 'materials', title: 'Materials', columns: ['E', 'density', 'alpha']},
  {key: 'combinations', title: 'Combinations', columns: null}
];
const LOAD_COLUMNS = ['member', 'members', 'node', 'w', 'P', 'M', 'at', 'from', 'to', 'dir', 'per', 'Fx', 'Fy', 'Mz',
  'uniform', 'gradient', 'ux', 'uy', 'rz'];

function cellFor(valueNode, onEdit) {
  if (!valueNode) {
    const i = el('input', {'aria-label': 'empty'});
    i.addEventListener('change', () => i.value.trim() && onEdit(i.value));
    return el('td', {}, i);
  }
  if (valueNode.text !== undefined) {
    const i = el('input', {value: valueNode.text});
    i.addEventListener('change', () => replaceValue(valueNode, i.value));
    return el('td', {}, i);
  }
  return el('td', {class: 'ro', title: 'edit this in the text'}, sourceOf(valueNode));
}

function sourceOf(node) {
  const t = text.value;
  const start = offsetOf(t, node.line, node.col);
  if (t[start] === '[' || t[start] === '{') {
    let depth = 0, i = start;
    for (; i < t.length; i++) {
      if (t[i] === '[' || t[i] === '{') depth++;
      else if (t[i] === ']' || t[i] === '}') { depth--; if (depth === 0) break; }
    }
    return t.slice(start, i + 1);
  }
  return '(' + (node.items ? node.items.length + ' items' : 'map') + ')';
}

function renderTables() {
  const box = $('tables');
  // the tables are drawn again from the text as read, the cell being typed in kept in focus
  const active = box.contains(document.activeElement) ? document.activeElement.dataset.cell : null;
  box.textContent = '';
  if (!state.outline || !state.outline.entries) {
    box.append(el('p', {class: 'hint'}, 'The tables show the model once its text reads.'));
    return;
  }
  for (const s of SECTIONS) box.append(sectionTable(s));
  box.append(loadsTable());
  if (active) {
    const again = [...box.querySelectorAll('input')].find(i => i.dataset.cell === active);
    if (again) again.focus();
  }
}

function tag(td, cell) {
  const i = td.querySelector('input');
  if (i) i.dataset.cell = cell;
  return td;
}

function sectionTable(s) {
  const entry = topEntry(s.key);
  const rows = entry && entry.value.entries ? entry.value.entries : [];
  let columns = s.columns;
  if (!columns) { // combinations: the load cases as columns
    const set = new Set();
    rows.forEach(r => (r.value.entries || []).forEach(e => set.add(e.key)));
    columns = [...set];
  }
  const table = el('table', {class: 'grid', 'data-section': s.key});
  table.append(el('caption', {}, s.title));
  table.append(el('tr', {}, el('th', {}, 'name'), ...columns.map(c => el('th', {}, c)), el('th', {}, '')));
  const spans = rows.map(r => ({first: r.line, last: lastLine(r.value)}));
  for (const r of rows) {
    const tr = el('tr', {'data-name': r.key});
    const nameCell = el('input', {value: r.key, 'aria-label': 'name', 'data-cell': s.key + '|' + r.key + '|name'});
    nameCell.addEventListener('change', () => replaceValue({line: r.line, col: r.col}, nameCell.value, true));
    tr.append(el('td', {}, nameCell));
    const v = r.value;
    columns.forEach((c, k) => {
      const cell = s.key + '|' + r.key + '|' + c;
      if (s.list && v.items) tr.append(tag(cellFor(v.items[k], null), cell));
      else if (v.text !== undefined) tr.append(c === s.single ? tag(cellFor(v, null), cell) : el('td', {class: 'ro'}, ''));
      else if (v.entries) {
        const f = v.entries.find(e => e.key === c);
        tr.append(tag(cellFor(f && f.value, val => addField(v, c, val)), cell));
      } else tr.append(el('td', {class: 'ro'}, ''));
    });
    const del = el('button', {type: 'button', title: 'remove ' + r.key}, '×');
    del.addEventListener('click', () => removeRow(r.line, lastLine(r.value), spans));
    tr.append(el('td', {}, del));
    tr.addEventListener('focusin', () => pick(s.key === 'members' ? 'member' : s.key === 'nodes' || s.key === 'supports' ? 'node' : null, r.key));
    table.append(tr);
  }
  // a row to add: written after the last row, as the section's rows are written
  const add = el('tr', {class: 'add'});
  const inputs = {name: el('input', {placeholder: 'new', 'aria-label': 'new ' + s.key + ' name'})};
  add.append(el('td', {}, inputs.name));
  columns.forEach(c => { inputs[c] = el('input', {placeholder: c, 'aria-label': 'new ' + c}); add.append(el('td', {}, inputs[c])); });
  const addButton = el('button', {type: 'button'}, 'Add');
  addButton.addEventListener('click', () => {
    const name = inputs.name.value.trim();
    if (!name) { say('Give the new row a name', true); return; }
    const vals = {};
    columns.forEach(c => { if (inputs[c].value.trim()) vals[c] = inputs[c].value.trim(); });
    let value;
    if (s.blank) value = s.blank(vals);
    else if (s.single && Object.keys(vals).length === 1 && vals[s.single]) value = yamlValue(vals[s.single]);
    else value = '{' + Object.entries(vals).map(([k, x]) => k + ': ' + yamlValue(x)).join(', ') + '}';
    const line = yamlValue(name) + ': ' + value;
    if (rows.length) insertLineAfter(lastLine(rows[rows.length - 1].value), ' '.repeat(rows[0].col - 1) + line);
    else if (entry) insertLineAfter(entry.line, '  ' + line);
    else if (isJson()) say('In a JSON model, add sections in the text; the tables change values only', true);
    else setText(text.value.replace(/\n*$/, '\n') + s.key + ':\n  ' + line + '\n', 'Section added');
  });
  add.append(el('td', {}, addButton));
  table.append(add);
  return table;
}

function loadsTable() {
  const table = el('table', {class: 'grid', 'data-section': 'loads'});
  table.append(el('caption', {}, 'Loads'));
  const entry = topEntry('loads');
  const cases = entry && entry.value.entries ? entry.value.entries : [];
  const used = new Set();
  const rows = [];
  for (const c of cases) {
    for (const list of c.value.entries || []) {
      if (!list.value.items) continue;
      list.value.items.forEach((item, k) => {
        (item.entries || []).forEach(e => used.add(e.key));
        rows.push({lc: c, list, item, k});
      });
    }
  }
  const columns = LOAD_COLUMNS.filter(c => used.has(c));
  table.append(el('tr', {}, el('th', {}, 'case'), el('th', {}, 'type'), el('th', {}, 'list'), ...columns.map(c => el('th', {}, c)), el('th', {}, '')));
  const spans = rows.map(r => ({first: r.item.line, last: lastLine(r.item)}));
  rows.forEach((r, index) => {
    const type = (r.lc.value.entries || []).find(e => e.key === 'type');
    const tr = el('tr', {'data-case': r.lc.key});
    tr.append(el('td', {}, r.lc.key), type ? cellFor(type.value, null) : el('td', {}, ''), el('td', {}, r.list.key));
    columns.forEach(c => {
      const f = (r.item.entries || []).find(e => e.key === c);
      tr.append(tag(cellFor(f && f.value, val => addField(r.item, c, val)), 'loads|' + index + '|' + c));
    });
    const del = el('button', {type: 'button', title: 'remove this load'}, '×');
    del.addEventListener('click', () => {
      const t = text.value;
      const lineText = t.split('\n')[r.item.line - 1];
      if (!/^\s*-\s/.test(lineText)) { say('This load shares its line with another; delete it in the text', true); return; }
      // the only load of its list takes the list's key with it
      if (r.list.value.items.length === 1 && r.list.line < r.item.line) removeRow(r.list.line, lastLine(r.item), []);
      else removeRow(r.item.line, lastLine(r.item), spans);
    });
    tr.append(el('td', {}, del));
    table.append(tr);
  });
  // a load to add: case, list and fields, written as a '- {...}' item after the list's last
  const add = el('tr', {class: 'add'});
  const caseIn = el('select', {'aria-label': 'new load case'});
  cases.forEach(c => caseIn.append(el('option', {value: c.key}, c.key)));
  const listIn = el('select', {'aria-label': 'new load list'});
  ['member_loads', 'node_loads'].forEach(l => listIn.append(el('option', {value: l}, l)));
  add.append(el('td', {}, caseIn), el('td', {}, ''), el('td', {}, listIn));
  const fields = ['member', 'node', 'w', 'P', 'M', 'at', 'dir', 'Fx', 'Fy', 'Mz'];
  const inputs = {};
  const fieldBox = el('td', {colspan: Math.max(1, columns.length)});
  fields.forEach(f => { inputs[f] = el('input', {placeholder: f, size: 5, 'aria-label': 'new load ' + f}); fieldBox.append(inputs[f]); });
  const addButton = el('button', {type: 'button'}, 'Add load');
  addButton.addEventListener('click', () => {
    const c = cases.find(x => x.key === caseIn.value);
    if (!c) { say('Write a load case in the text first', true); return; }
    const pairs = fields.filter(f => inputs[f].value.trim()).map(f => f + ': ' + yamlValue(inputs[f].value));
    if (!pairs.length) { say('Give the load its fields', true); return; }
    const item = '{' + pairs.join(', ') + '}';
    const list = (c.value.entries || []).find(e => e.key === listIn.value);
    if (list && list.value.items && list.value.items.length) {
      const first = list.value.items[0];
      const dash = text.value.split('\n')[first.line - 1].indexOf('-');
      insertLineAfter(lastLine(list.value), ' '.repeat(Math.max(0, dash)) + '- ' + item);
    } else if (!list && c.value.entries && c.value.entries.length) {
      const indent = ' '.repeat(c.value.entries[0].col - 1);
      insertLineAfter(lastLine(c.value), indent + listIn.value + ':\n' + indent + '  - ' + item);
    } else say('Add this load in the text (the list is written in another form)', true);
  });
  add.append(fieldBox, el('td', {}, addButton));
  table.append(add);
  return table;
}

// ---------- the drawing ----------

function fillLoadCases() {
  const sel = $('load-case');
  const keep = sel.value;
  sel.textContent = '';
  sel.append(el('option', {value: ''}, '(none)'));
  for (const c of (state.view && state.view.cases) || []) sel.append(el('option', {value: c.name}, c.name + ' (' + c.type + ')'));
  if ([...sel.options].some(o => o.value === keep) && keep) sel.value = keep;
  else if (sel.options.length > 1) sel.value = sel.options[1].value;
}
$('load-case').addEventListener('change', draw);

function flaggedNames() {
  const out = {members: new Map(), nodes: new Map()};
  if (!state.results) return out;
  for (const c of state.results.claims || []) {
    if (c.status === 'ok') continue;
    const bag = c.item === 'member' ? out.members : out.nodes;
    bag.set(c.name, (bag.get(c.name) || 0) + 1);
  }
  return out;
}

function draw() {
  const svg = $('drawing');
  svg.textContent = '';
  const v = state.view;
  $('drawing-note').textContent = !v ? 'The drawing appears when the model reads without problems.'
    : state.viewIsCurrent ? plural(v.nodes.length, 'node') + ', ' + plural(v.members.length, 'member') + '; units ' + v.units.force + ', ' + v.units.length
      + '; dimensions in ' + v.units.length
      : 'Showing the last model that read without problems; see the messages.';
  if (!v || !v.nodes.length) return;
  const W = svg.clientWidth || 600, H = svg.clientHeight || 300, pad = 56;
  svg.setAttribute('viewBox', `0 0 ${W} ${H}`);
  const xs = v.nodes.map(n => n.x), ys = v.nodes.map(n => n.y);
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const span = Math.max(maxX - minX, maxY - minY, 1e-9);
  const scale = Math.min((W - 2 * pad) / Math.max(maxX - minX, span * 0.05), (H - 2 * pad) / Math.max(maxY - minY, span * 0.05));
  const ox = (W - (maxX - minX) * scale) / 2, oy = (H - (maxY - minY) * scale) / 2;
  const X = x => ox + (x - minX) * scale, Y = y => H - oy - (y - minY) * scale; // y up in the model, down on screen
  const nodes = new Map(v.nodes.map(n => [n.name, n]));
  const flagged = flaggedNames();
  const g = (cls) => { const e = document.createElementNS(SVG, 'g'); if (cls) e.setAttribute('class', cls); svg.append(e); return e; };
  const put = (parent, tag, attrs, textContent) => {
    const e = document.createElementNS(SVG, tag);
    for (const [k, val] of Object.entries(attrs)) e.setAttribute(k, val);
    if (textContent !== undefined) e.textContent = textContent;
    parent.append(e);
    return e;
  };
  const dims = g('dims'), structure = g('structure'), loads = g('loads'), labels = g('labels');
  // overall dimensions along the bottom and the left, between distinct coordinates
  const ux = [...new Set(xs.map(x => +x.toFixed(9)))].sort((a, b) => a - b);
  const uy = [...new Set(ys.map(y => +y.toFixed(9)))].sort((a, b) => a - b);
  if (ux.length > 1 && ux.length <= 12) {
    const yLine = H - 14;
    ux.forEach((x, k) => {
      put(dims, 'line', {x1: X(x), y1: yLine - 5, x2: X(x), y2: yLine + 5, class: 'dim'});
      if (k) {
        put(dims, 'line', {x1: X(ux[k - 1]), y1: yLine, x2: X(x), y2: yLine, class: 'dim'});
        put(labels, 'text', {x: (X(x) + X(ux[k - 1])) / 2, y: yLine - 3, 'text-anchor': 'middle', class: 'value'}, fmt(x - ux[k - 1]));
      }
    });
  }
  if (uy.length > 1 && uy.length <= 12) {
    const xLine = 14;
    uy.forEach((y, k) => {
      put(dims, 'line', {x1: xLine - 5, y1: Y(y), x2: xLine + 5, y2: Y(y), class: 'dim'});
      if (k) {
        put(dims, 'line', {x1: xLine, y1: Y(uy[k - 1]), x2: xLine, y2: Y(y), class: 'dim'});
        put(labels, 'text', {x: xLine + 4, y: (Y(y) + Y(uy[k - 1])) / 2, class: 'value'}, fmt(y - uy[k - 1]));
      }
    });
  }
  // members: a line, an arrowhead at midspan pointing from start to end, hinges as open circles
  for (const m of v.members) {
    const a = nodes.get(m.from), b = nodes.get(m.to);
    const x1 = X(a.x), y1 = Y(a.y), x2 = X(b.x), y2 = Y(b.y);
    const len = Math.hypot(x2 - x1, y2 - y1) || 1, ex = (x2 - x1) / len, ey = (y2 - y1) / len;
    const cls = 'member' + (m.truss ? ' truss' : '') + (flagged.members.has(m.name) ? ' flagged' : '')
      + (state.picked && state.picked.kind === 'member' && state.picked.name === m.name ? ' picked' : '');
    put(structure, 'line', {x1, y1, x2, y2, class: cls, 'data-member': m.name});
    const mx = (x1 + x2) / 2, my = (y1 + y2) / 2;
    put(structure, 'path', {d: `M${mx + ex * 6},${my + ey * 6} L${mx - ex * 4 - ey * 4},${my - ey * 4 + ex * 4} L${mx - ex * 4 + ey * 4},${my - ey * 4 - ex * 4} Z`, class: 'head'});
    if (m.hingeStart || m.truss) put(structure, 'circle', {cx: x1 + ex * 7, cy: y1 + ey * 7, r: 3.5, class: 'hinge'});
    if (m.hingeEnd || m.truss) put(structure, 'circle', {cx: x2 - ex * 7, cy: y2 - ey * 7, r: 3.5, class: 'hinge'});
    const hit = put(structure, 'line', {x1, y1, x2, y2, class: 'hit', 'data-member': m.name});
    put(hit, 'title', {}, m.name + ': ' + m.from + ' → ' + m.to + ', ' + m.length + (m.truss ? ', truss' : ''));
    hit.addEventListener('click', () => pick('member', m.name));
    put(labels, 'text', {x: mx - ey * 12, y: my + ex * 12 + 4, 'text-anchor': 'middle', class: 'name'}, m.name);
    if (flagged.members.has(m.name)) put(labels, 'text', {x: mx + ey * 14, y: my - ex * 14 + 4, 'text-anchor': 'middle', class: 'badge'}, '!' + flagged.members.get(m.name));
  }
  // supports: fixed (all three) a hatched base, pinned a triangle, a roller a triangle on a line, springs a zigzag
  for (const s of v.supports) {
    const n = nodes.get(s.node);
    const x = X(n.x), y = Y(n.y);
    const grp = put(structure, 'g', {class: 'support' + (flagged.nodes.has(s.node) ? ' flagged' : ''), transform: `rotate(${-s.angleDeg} ${x} ${y})`});
    const [fx, fy, fr] = s.fix;
    if (fx && fy && fr) {
      put(grp, 'line', {x1: x - 14, y1: y + 2, x2: x + 14, y2: y + 2});
      for (let k = -12; k <= 12; k += 6) put(grp, 'line', {x1: x + k, y1: y + 2, x2: x + k - 5, y2: y + 8});
    } else if (fx && fy) {
      put(grp, 'path', {d: `M${x},${y} L${x - 9},${y + 14} L${x + 9},${y + 14} Z`});
      put(grp, 'line', {x1: x - 13, y1: y + 14, x2: x + 13, y2: y + 14});
    } else if (fy || fx) {
      const r = fx && !fy ? `rotate(90 ${x} ${y})` : '';
      const sub = put(grp, 'g', {transform: r});
      put(sub, 'path', {d: `M${x},${y} L${x - 8},${y + 12} L${x + 8},${y + 12} Z`});
      put(sub, 'line', {x1: x - 12, y1: y + 17, x2: x + 12, y2: y + 17});
      put(sub, 'circle', {cx: x - 4, cy: y + 14.5, r: 2.2});
      put(sub, 'circle', {cx: x + 4, cy: y + 14.5, r: 2.2});
    } else if (fr) {
      put(grp, 'rect', {x: x - 6, y: y - 6, width: 12, height: 12});
    }
    if (s.springs.some(b => b)) put(grp, 'path', {d: `M${x},${y + 2} l-5,4 l10,4 l-10,4 l10,4 l-5,4`});
  }
  // nodes
  for (const n of v.nodes) {
    const c = put(structure, 'circle', {cx: X(n.x), cy: Y(n.y), r: 3.6, 'data-node': n.name,
      class: 'node' + (flagged.nodes.has(n.name) ? ' flagged' : '') + (state.picked && state.picked.kind === 'node' && state.picked.name === n.name ? ' picked' : '')});
    put(c, 'title', {}, n.name + ' (' + fmt(n.x) + ', ' + fmt(n.y) + ') ' + v.units.length);
    c.addEventListener('click', () => pick('node', n.name));
    put(labels, 'text', {x: X(n.x) + 6, y: Y(n.y) - 6, class: 'name'}, n.name);
    if (flagged.nodes.has(n.name)) put(labels, 'text', {x: X(n.x) - 16, y: Y(n.y) - 6, class: 'badge'}, '!' + flagged.nodes.get(n.name));
  }
  // the loads of the chosen case: arrows in the direction each acts, the value beside them
  const lc = (v.cases || []).find(c => c.name === $('load-case').value);
  if (lc) drawLoads(lc, v, nodes, X, Y, loads, labels, put);
}

function drawLoads(lc, v, nodes, X, Y, loads, labels, put) {
  const arrow = (x1, y1, x2, y2) => {
    put(loads, 'line', {x1, y1, x2, y2, class: 'load'});
    const l = Math.hypot(x2 - x1, y2 - y1) || 1, ux = (x2 - x1) / l, uy = (y2 - y1) / l;
    put(loads, 'path', {d: `M${x2},${y2} L${x2 - ux * 7 - uy * 3},${y2 - uy * 7 + ux * 3} L${x2 - ux * 7 + uy * 3},${y2 - uy * 7 - ux * 3} Z`, class: 'head'});
  };
  const members = new Map(v.members.map(m => [m.name, m]));
  const along = (m, s) => { // a point at distance s (model units) from the member's start, on screen
    const a = nodes.get(m.from), b = nodes.get(m.to);
    const L = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    return [X(a.x + (b.x - a.x) * s / L), Y(a.y + (b.y - a.y) * s / L)];
  };
  for (const l of lc.loads) {
    if (l.kind === 'distributed') {
      const m = members.get(l.member);
      const sign = Math.sign(l.w1 + l.w2) || 1;
      const dx = l.dir[0] * sign, dy = -l.dir[1] * sign; // screen y is down
      const peak = Math.max(Math.abs(l.w1), Math.abs(l.w2)) || 1;
      let tailPrev = null, mid = null;
      for (let k = 0; k <= 6; k++) {
        const s = l.from + (l.to - l.from) * k / 6;
        const w = Math.abs(l.w1 + (l.w2 - l.w1) * k / 6) / peak;
        const [px, py] = along(m, s);
        const len = 8 + 22 * w;
        const tx = px - dx * len, ty = py - dy * len;
        if (w > 0.02) arrow(tx, ty, px, py);
        if (tailPrev) put(loads, 'line', {x1: tailPrev[0], y1: tailPrev[1], x2: tx, y2: ty, class: 'load'});
        tailPrev = [tx, ty];
        if (k === 3) mid = [tx, ty];
      }
      put(labels, 'text', {x: mid[0] - dx * 6, y: mid[1] - dy * 6 + 4, 'text-anchor': 'middle', class: 'value'}, l.label);
    } else if (l.kind === 'point') {
      const m = members.get(l.member);
      const [px, py] = along(m, l.at);
      const sign = Math.sign(l.value) || 1, dx = l.dir[0] * sign, dy = -l.dir[1] * sign;
      arrow(px - dx * 34, py - dy * 34, px, py);
      put(labels, 'text', {x: px - dx * 40, y: py - dy * 40 + 4, 'text-anchor': 'middle', class: 'value'}, l.label);
    } else if (l.kind === 'couple' || (l.kind === 'node' && l.mz)) {
      const p = l.kind === 'couple' ? along(members.get(l.member), l.at) : [X(nodes.get(l.node).x), Y(nodes.get(l.node).y)];
      const ccw = (l.kind === 'couple' ? l.value : l.mz) > 0;
      put(loads, 'path', {d: `M${p[0] + 12},${p[1]} A12,12 0 1 ${ccw ? 0 : 1} ${p[0]},${p[1] + (ccw ? 12 : -12)}`, class: 'load'});
      put(labels, 'text', {x: p[0] + 14, y: p[1] - 12, class: 'value'}, l.label);
    }
    if (l.kind === 'node' && (l.fx || l.fy)) {
      const n = nodes.get(l.node);
      const mag = Math.hypot(l.fx, l.fy), dx = l.fx / mag, dy = -l.fy / mag;
      const px = X(n.x), py = Y(n.y);
      arrow(px - dx * 38, py - dy * 38, px - dx * 4, py - dy * 4);
      put(labels, 'text', {x: px - dx * 44, y: py - dy * 44 + 4, 'text-anchor': dx > 0 ? 'end' : 'start', class: 'value'}, l.label);
    }
    if (l.kind === 'note') {
      const p = l.node ? [X(nodes.get(l.node).x), Y(nodes.get(l.node).y)] : along(members.get(l.member), 0);
      put(labels, 'text', {x: p[0] + 8, y: p[1] + 16, class: 'value'}, l.label);
    }
  }
}

function plural(n, word) {
  return n + ' ' + word + (n === 1 ? '' : 's');
}

function fmt(x) {
  const r = Math.round(x * 1e4) / 1e4;
  return String(Object.is(r, -0) ? 0 : r);
}

// ---------- the inspector: the picked member or node, its fields editable ----------

function pick(kind, name) {
  if (!kind) return;
  state.picked = {kind, name};
  const box = $('inspector');
  box.textContent = '';
  const section = kind === 'member' ? 'members' : 'nodes';
  const entry = topEntry(section);
  const row = entry && entry.value.entries ? entry.value.entries.find(e => e.key === name) : null;
  box.append(el('h3', {}, (kind === 'member' ? 'Member ' : 'Node ') + name));
  const t = el('table', {class: 'grid'});
  if (row && row.value.entries) {
    for (const f of row.value.entries) t.append(el('tr', {}, el('th', {}, f.key), cellFor(f.value, null)));
  } else if (row && row.value.items) {
    ['x', 'y'].forEach((c, k) => t.append(el('tr', {}, el('th', {}, c), cellFor(row.value.items[k], null))));
  }
  if (kind === 'node') {
    const sup = topEntry('supports');
    const s = sup && sup.value.entries ? sup.value.entries.find(e => e.key === name) : null;
    t.append(el('tr', {}, el('th', {}, 'support'), s ? cellFor(s.value, null) : el('td', {class: 'ro'}, 'free')));
  }
  box.append(t);
  if (row) {
    const go = el('button', {type: 'button'}, 'Show in the text');
    go.addEventListener('click', () => goToLine(row.line));
    box.append(go);
  }
  if (state.run && state.run.status === 'checked') {
    const mine = state.run.claims.filter(c => c.name === name && (c.item === 'member') === (kind === 'member'));
    if (mine.length) {
      const ct = el('table', {class: 'grid'});
      ct.append(el('caption', {}, 'Claims (claimed / stiffness method, difference)'));
      for (const c of mine) ct.append(el('tr', {class: c.status === 'ok' ? '' : 'flag'}, el('td', {class: 'status-' + c.status}, c.status),
        el('td', {}, c.quantity + ' ' + c.combo), el('td', {class: 'num'}, c.claimed), el('td', {class: 'num'}, c.stiffness),
        el('td', {class: 'num'}, c.difference)));
      box.append(ct);
    }
  }
  draw(); // the picked member or node is drawn in the picking colour
}

// ---------- claims ----------

const CLAIM_COLUMNS = ['item', 'combo', 'name', 'quantity', 'value', 'unit', 'tolerance', 'at'];
let claimRows = [];

function renderClaims() {
  const t = $('claims');
  t.textContent = '';
  t.append(el('tr', {}, el('th', {}, '#'), ...CLAIM_COLUMNS.map(c => el('th', {}, c)), el('th', {}, '')));
  claimRows.forEach((r, i) => {
    const tr = el('tr', {'data-row': i});
    tr.append(el('td', {class: 'ro'}, String(i + 1)));
    for (const c of CLAIM_COLUMNS) {
      const input = el('input', {value: r[c] || '', 'aria-label': c + ' of row ' + (i + 1), 'data-col': c});
      input.addEventListener('change', () => { r[c] = input.value; });
      tr.append(el('td', {}, input));
    }
    const del = el('button', {type: 'button', title: 'remove row ' + (i + 1)}, '×');
    del.addEventListener('click', () => { claimRows.splice(i, 1); renderClaims(); });
    tr.append(el('td', {}, del));
    t.append(tr);
  });
  // the last row is always empty, to type or paste into
  const tr = el('tr', {'data-row': 'new'});
  tr.append(el('td', {class: 'ro'}, '+'));
  for (const c of CLAIM_COLUMNS) {
    const input = el('input', {placeholder: c, 'aria-label': 'new claim ' + c, 'data-col': c});
    input.addEventListener('change', () => { if (input.value.trim()) { const r = {}; r[c] = input.value; claimRows.push(r); renderClaims(); } });
    tr.append(el('td', {}, input));
  }
  tr.append(el('td', {}, ''));
  t.append(tr);
}

// A block pasted from a spreadsheet: tab-separated (or ';' as some locales export, with
// decimal commas). A first row naming the columns sets their order; else the CSV order.
function parseBlock(block) {
  const lines = block.replace(/\r\n?/g, '\n').split('\n').filter(l => l.trim() !== '');
  if (!lines.length) return [];
  const sep = lines.some(l => l.includes('\t')) ? '\t' : lines[0].includes(';') ? ';' : ',';
  let cols = CLAIM_COLUMNS;
  const head = splitRow(lines[0], sep).map(h => h.trim().toLowerCase());
  if (head.includes('item') && head.includes('quantity')) { cols = head; lines.shift(); }
  const rows = [];
  for (const l of lines) {
    if (l.trim().startsWith('#')) continue;
    const cells = splitRow(l, sep);
    const r = {};
    cols.forEach((c, k) => { if (CLAIM_COLUMNS.includes(c) && cells[k] !== undefined) r[c] = cells[k].trim(); });
    // a decimal comma ("14,7") where the block is not comma-separated; "1,500" stays as written (it may be a thousand)
    if (sep !== ',' && r.value && /^[-+]?\d+,\d+$/.test(r.value) && !/^[-+]?\d{1,3},\d{3}$/.test(r.value)) r.value = r.value.replace(',', '.');
    if (Object.values(r).some(x => x)) rows.push(r);
  }
  return rows;
}

function splitRow(line, sep) {
  const out = [];
  let cur = '', quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') { cur += '"'; i++; } else if (ch === '"') quoted = false; else cur += ch;
    } else if (ch === '"' && cur === '') quoted = true;
    else if (ch === sep) { out.push(cur); cur = ''; } else cur += ch;
  }
  out.push(cur);
  return out;
}

$('claims').addEventListener('paste', ev => {
  const block = ev.clipboardData.getData('text/plain');
  if (!block.includes('\n') && !block.includes('\t') && !block.includes(';')) return; // one value: the cell takes it
  ev.preventDefault();
  const rows = parseBlock(block);
  claimRows.push(...rows);
  renderClaims();
  say(rows.length + ' claim rows pasted');
});

function csvField(s) {
  s = String(s == null ? '' : s);
  return /[",\n]/.test(s) ? '"' + s.replace(/"/g, '""') + '"' : s;
}

// The claims as the CSV file the check reads; rows without a value are not claims yet.
function claimsCsv() {
  const lines = [CLAIM_COLUMNS.join(',')];
  for (const r of claimRows) if ((r.value || '').trim()) lines.push(CLAIM_COLUMNS.map(c => csvField((r[c] || '').trim())).join(','));
  return lines.join('\n') + '\n';
}

function claimsSources() {
  if (state.claimsMode === 'text') {
    return $('claims-text').value.trim() ? [{name: $('claims-name').value, text: $('claims-text').value}] : [];
  }
  return claimRows.some(r => (r.value || '').trim()) ? [{name: $('claims-name').value, text: claimsCsv()}] : [];
}

function setClaimsMode(mode) {
  state.claimsMode = mode;
  $('claims').hidden = mode !== 'table';
  $('claims-text').hidden = mode !== 'text';
  $('template').disabled = mode !== 'table';
  $('clear-empty').disabled = mode !== 'table';
}

$('template').addEventListener('click', async () => {
  try {
    const a = await api('POST', '/api/template', {name: $('model-name').value, text: text.value});
    if (a.problems.length) { say('The model has problems; the template needs a model that reads', true); return; }
    claimRows.push(...a.rows.map(r => ({item: r.item, combo: r.combo, name: r.name, quantity: r.quantity, at: r.at})));
    renderClaims();
    say(a.rows.length + ' template rows added; fill in the values claimed');
  } catch (e) { say(e.message, true); }
});
$('clear-empty').addEventListener('click', () => { claimRows = claimRows.filter(r => (r.value || '').trim()); renderClaims(); });

// ---------- files ----------

async function listFiles() {
  try {
    const a = await api('GET', '/api/files');
    const sel = $('open-file');
    sel.textContent = '';
    sel.append(el('option', {value: ''}, 'files in ' + a.folder.split(/[\\/]/).pop() + '…'));
    for (const f of a.files) sel.append(el('option', {value: f.name}, f.name));
  } catch (e) { say(e.message, true); }
}

$('open-file').addEventListener('change', async ev => {
  const name = ev.target.value;
  if (!name) return;
  try {
    const a = await api('GET', '/api/file?name=' + encodeURIComponent(name));
    const isClaims = /\.csv$/i.test(name) || (/^\s*(#.*\n|\s*\n)*claims\s*:/m.test(a.text) && !/^format\s*:/m.test(a.text));
    if (isClaims) {
      $('claims-name').value = name;
      if (/\.csv$/i.test(name)) {
        claimRows = parseBlock(a.text.split('\n').filter(l => !l.startsWith('#')).join('\n'));
        setClaimsMode('table');
        renderClaims();
      } else {
        $('claims-text').value = a.text;
        setClaimsMode('text');
      }
      showTab('lower', 'claims');
      say('Opened claims ' + name);
    } else {
      $('model-name').value = name;
      text.value = a.text;
      markPending();
      drawGutter([]);
      say('Opened ' + name);
      validate();
    }
  } catch (e) { say(e.message, true); }
  ev.target.value = '';
});

async function save(name, body) {
  try {
    await api('PUT', '/api/file?name=' + encodeURIComponent(name), {text: body});
    say('Saved ' + name);
  } catch (e) {
    if (e.status === 409 && confirm(name + ' exists in the folder. Replace it?')) {
      try {
        await api('PUT', '/api/file?replace=1&name=' + encodeURIComponent(name), {text: body});
        say('Saved ' + name);
      } catch (e2) { say(e2.message, true); }
    } else say(e.message, true);
  }
  listFiles();
}
$('save-model').addEventListener('click', () => save($('model-name').value, text.value));
$('save-claims').addEventListener('click', () => save($('claims-name').value, state.claimsMode === 'text' ? $('claims-text').value : claimsCsv()));

// ---------- check ----------


$('check').addEventListener('click', async () => {
  const b = $('check');
  b.disabled = true;
  say('Checking…');
  // nothing of an earlier check stays on the page while this one runs or if it fails
  state.run = null;
  state.results = null;
  for (const id of ['results', 'explanations', 'diagrams', 'console', 'diagram-set']) $(id).textContent = '';
  draw();
  try {
    const a = await api('POST', '/api/check', {name: $('model-name').value, text: text.value, claims: claimsSources(), tolerance: $('tolerance').value});
    state.run = a;
    if (a.status === 'input') {
      state.results = null;
      showResultsProblems(a.problems);
      say(a.problems.length + ' input problem' + (a.problems.length === 1 ? '' : 's') + '; nothing was analysed', true);
    } else if (a.status === 'refused') {
      state.results = null;
      $('results').textContent = '';
      $('results').append(el('pre', {}, a.lines.join('\n')));
      say('The check was not run', true);
    } else {
      const res = await fetch(withKey('/api/run/' + a.run + '/results.json'));
      state.results = await res.json();
      showResults(a);
      say('Checked: ' + state.results.verdict.toUpperCase(), a.exit !== 0);
    }
    showTab('lower', 'results');
    draw();
  } catch (e) {
    say(e.message, true);
  } finally {
    b.disabled = false;
  }
});

function showResultsProblems(problems) {
  const box = $('results');
  box.textContent = '';
  box.append(el('p', {class: 'verdict status-mismatch'}, 'Input problems: nothing was analysed'));
  const ul = el('ul');
  for (const p of problems) ul.append(el('li', {}, p.text));
  box.append(ul);
}

function showResults(a) {
  const r = state.results;
  const box = $('results');
  box.textContent = '';
  box.append(el('p', {class: 'verdict status-' + (r.verdict === 'ok' ? 'ok' : r.verdict === 'marginal' ? 'marginal' : 'mismatch')},
    'Verdict: ' + r.verdict.toUpperCase()));
  const dl = el('p', {class: 'downloads'},
    el('a', {href: withKey('/api/run/' + a.run + '/report.pdf?download=1'), download: a.stem + '-report.pdf', id: 'download-pdf'}, 'Download the PDF report'),
    el('a', {href: withKey('/api/run/' + a.run + '/results.json?download=1'), download: a.stem + '-results.json', id: 'download-json'}, 'Download the results (JSON)'));
  box.append(dl);
  const flagged = (r.claims || []).filter(c => c.status !== 'ok').length;
  box.append(el('p', {}, (r.claims || []).length + ' claims, ' + flagged + ' flagged. A difference is relative to the computed '
    + 'value, or in units where the absolute floor governs (a claimed zero against rounding)'
    + (r.agreement && r.agreement.max_relative_difference != null
      ? '; the two methods agree to ' + r.agreement.max_relative_difference.toExponential(1) + ' (largest relative difference)' : '')
    + '. The JSON and the PDF report give every figure in full.'));
  // the rows as the report prints them (values to the same decimals, the difference in units where
  // the absolute floor governs, the tolerance a claim was judged by), flagged first
  const t = el('table', {class: 'grid', id: 'discrepancies'});
  t.append(el('tr', {}, ...['status', 'item', 'name', 'quantity', 'load set', 'claimed', 'stiffness method', 'force method',
    'difference', 'tolerance', 'likely cause', 'written at'].map(h => el('th', {}, h))));
  const order = {mismatch: 0, marginal: 1, ok: 2};
  const rows = [...a.claims].sort((x, y) => (order[x.status] ?? 3) - (order[y.status] ?? 3));
  for (const c of rows) {
    const tr = el('tr', {class: c.status === 'mismatch' ? 'flag' : c.status === 'marginal' ? 'mild' : '', 'data-id': c.id},
      el('td', {class: 'status-' + c.status}, c.status),
      el('td', {}, c.item), el('td', {}, c.name), el('td', {}, c.quantity), el('td', {}, c.combo),
      el('td', {class: 'num'}, c.claimed), el('td', {class: 'num'}, c.stiffness), el('td', {class: 'num'}, c.force),
      el('td', {class: 'num'}, c.difference), el('td', {class: 'num'}, c.tolerance),
      el('td', {}, c.diagnosis), el('td', {}, c.source));
    tr.addEventListener('click', () => pick(c.item === 'member' ? 'member' : 'node', c.name));
    t.append(tr);
  }
  box.append(t);
  const ex = $('explanations');
  ex.textContent = '';
  const exps = r.explanations || [];
  if (!exps.length) ex.append(el('p', {class: 'hint'}, 'No one change to the model or the claims explains two or more flagged claims together; see each flagged claim\'s likely cause.'));
  for (const e of exps) {
    ex.append(el('div', {class: 'explanation'},
      el('p', {}, el('strong', {}, e.sentence)),
      el('p', {}, 'Explains ' + e.explains.join(', ') + (e.breaks.length ? '; breaks ' + e.breaks.join(', ') : '; breaks none that agree')
        + (e.all_ok_after ? '. With it every claim agrees.' : '.'))));
  }
  $('console').textContent = a.console;
  const sel = $('diagram-set');
  sel.textContent = '';
  for (const s of a.loadSets) sel.append(el('option', {value: s}, s + (a.drawn.includes(s) ? ' (in the report)' : '')));
  if (a.drawn.length) sel.value = a.drawn[0];
  showDiagrams();
}

async function showDiagrams() {
  const box = $('diagrams');
  box.textContent = '';
  if (!state.run || state.run.status !== 'checked') return;
  const set = $('diagram-set').value;
  try {
    const a = await api('GET', '/api/run/' + state.run.run + '/figures?set=' + encodeURIComponent(set));
    for (const f of a.files) {
      box.append(el('img', {src: withKey('/api/run/' + state.run.run + '/figure/' + encodeURIComponent(f) + '?set=' + encodeURIComponent(set)), alt: f}));
    }
    if (!a.files.length) box.append(el('p', {class: 'hint'}, 'No diagrams: the model is not stable.'));
  } catch (e) { say(e.message, true); }
}
$('diagram-set').addEventListener('change', showDiagrams);

// ---------- start ----------

const STARTER = `format: plumbline/1
job:
  title: New check
units: {force: kN, length: m}
materials:
  steel: {E: 210 GPa}
sections:
  B1: {A: 5380 mm2, I: 8.36e7 mm4, material: steel}
nodes:
  A: [0, 0]
  B: [6, 0]
supports:
  A: pinned
  B: roller
members:
  M1: {from: A, to: B, section: B1}
loads:
  D:
    type: dead
    member_loads:
      - {member: M1, w: -10}
combinations:
  ULS: {D: 1.35}
`;

text.value = STARTER;
drawGutter([]);
setClaimsMode('table');
renderClaims();
listFiles();
validate();
window.addEventListener('resize', draw);
