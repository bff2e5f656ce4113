// Halfbreadth's page. A client of the service's own API: every number and every plot
// comes from it (the plots are the SVG of core/plots, drawn by the service), so the
// page computes nothing itself. No library, no build step, nothing from the network
// but this service.

const $ = (id) => document.getElementById(id);

/** What is shown: a stored hull ({ kind: 'stored', id, name }) or a file ({ kind: 'file', name, text }). */
let source = null;
/** Text of the plots shown, by figure id, for their downloads. */
const svgs = {};
/** Hydrostatic fields with their units and labels, from the first table answered. */
const FIELD_LABELS = {
  draft: ['Draft', 'm'], volume: ['Volume', 'm³'], displacement: ['Displacement', 't'], lcb: ['LCB', 'm'], vcb: ['VCB (KB)', 'm'],
  waterplaneArea: ['Aw', 'm²'], lcf: ['LCF', 'm'], iT: ['IT', 'm⁴'], iL: ['IL', 'm⁴'], bmt: ['BMt', 'm'], bml: ['BMl', 'm'],
  kmt: ['KMt', 'm'], kml: ['KMl', 'm'], tpc: ['TPC', 't/cm'], mct1cm: ['MCT 1 cm', 't·m/cm'], lwl: ['LWL', 'm'], bwl: ['BWL', 'm'],
  am: ['Am', 'm²'], cb: ['Cb', ''], cm: ['Cm', ''], cp: ['Cp', ''], cwp: ['Cwp', ''], wettedSurface: ['Wetted surface', 'm²'],
};
const DECIMALS = { m: 3, 'm²': 2, 'm³': 3, 'm⁴': 1, t: 2, 't/cm': 3, 't·m/cm': 3, '': 4 };

function cell(value, unit) {
  return typeof value === 'number' && Number.isFinite(value) ? value.toFixed(DECIMALS[unit] ?? 3) : '–';
}

function say(text) {
  $('status').textContent = text;
}

/** A request to the service about the hull shown: GET on a stored hull, POST of the file otherwise. */
async function ask(path, query = {}, { svg = false, csv = false } = {}) {
  const q = new URLSearchParams(Object.entries(query).filter(([, v]) => v !== undefined && v !== ''));
  if (csv) q.set('format', 'csv');
  const qs = q.toString() === '' ? '' : `?${q}`;
  const headers = { accept: svg ? 'image/svg+xml' : csv ? 'text/csv' : 'application/json' };
  let res;
  if (source.kind === 'stored') {
    const url = svg ? `/v1/hulls/${encodeURIComponent(source.id)}/plots/${path}.svg${qs}` : `/v1/hulls/${encodeURIComponent(source.id)}/${path}${qs}`;
    res = await fetch(url, { headers });
  } else {
    const url = svg ? `/v1/plots/${path}.svg${qs}` : `/v1/${path}${qs}`;
    res = await fetch(url, { method: 'POST', headers: { ...headers, 'content-type': 'text/csv' }, body: source.text });
  }
  if (!res.ok) {
    let detail = `${res.status} ${res.statusText}`;
    try {
      const p = await res.json();
      detail = (p.errors ?? []).map((e) => e.message).join('; ') || p.detail || p.title || detail;
    } catch { /* not a problem document */ }
    throw new Error(detail);
  }
  return svg || csv ? res.text() : res.json();
}

function saveText(filename, text, type) {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function baseName() {
  return (source?.kind === 'stored' ? source.id : (source?.name ?? 'hull').replace(/\.csv$/i, '')).replace(/[^A-Za-z0-9_-]+/g, '-');
}

function showSvg(figureId, svgText) {
  svgs[figureId] = svgText;
  const fig = $(figureId);
  // The SVG is the service's own output, with every text of the input escaped.
  fig.innerHTML = svgText;
}

function facts(dl, pairs) {
  dl.replaceChildren(...pairs.flatMap(([k, v]) => {
    const dt = document.createElement('dt');
    dt.textContent = k;
    const dd = document.createElement('dd');
    dd.textContent = v;
    return [dt, dd];
  }));
}

function list(items, cls) {
  const ul = document.createElement('ul');
  if (cls) ul.className = cls;
  for (const t of items) {
    const li = document.createElement('li');
    li.textContent = t;
    ul.append(li);
  }
  return ul;
}

/** A round step that gives about fifteen drafts between keel and deck. */
function roundStep(span) {
  const raw = span / 15;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}
const trim = (v) => String(Number(v.toFixed(6)));

function defaultRange(keel, deck) {
  const step = roundStep(deck - keel);
  let from = Math.ceil((keel + 1e-9) / step) * step;
  if (from <= keel) from += step;
  const to = Math.floor((deck + 1e-9) / step) * step;
  return { from: trim(from), step: trim(step), to: trim(to), mid: trim(Math.round((from + to) / 2 / step) * step) };
}

async function showHull() {
  for (const id of ['hull-section', 'lines-section', 'hydro-section', 'sheet-section', 'loading-section', 'cross-section']) $(id).hidden = true;
  say(`Reading ${source.name}…`);
  const check = await ask('check');
  $('hull-section').hidden = false;
  $('hull-title').textContent = `2. The hull: ${check.hull?.name ?? source.name}`;
  $('problems').replaceChildren();
  $('warnings').replaceChildren();
  $('report-link').hidden = true;
  if (!check.valid) {
    const head = document.createElement('p');
    head.className = 'problem';
    head.textContent = `${source.name} cannot be read as a hull: ${check.issues.length} problem${check.issues.length === 1 ? '' : 's'}.`;
    $('problems').append(head, list(check.issues.map((i) => i.message)));
    facts($('particulars'), []);
    say('The file has problems: see the list.');
    return;
  }
  const h = check.hull;
  const p = check.particulars;
  facts($('particulars'), [
    ['Name', h.name],
    ['Offsets', `${p.form} form, lengths in ${p.units}; ${h.stations} stations${h.waterlines === null ? '' : `, ${h.waterlines} waterlines`}; ${p.points} points, ${p.knuckles} knuckles`],
    ['Perpendiculars', `AP x = ${h.ap} m, FP x = ${h.fp} m, LBP ${h.lbp} m`],
    ['Drafts', `above the lowest keel (z = ${p.lowestKeel} m), up to the lowest deck edge (z = ${p.lowestDeck} m)`],
    ['Fairness', check.warnings.length === 0 ? 'no offset looks unfair' : `${check.warnings.length} offset${check.warnings.length === 1 ? '' : 's'} may be unfair (ringed on the lines)`],
  ]);
  if (check.warnings.length > 0) {
    const head = document.createElement('p');
    head.textContent = 'Offsets that may be unfair (a warning: the figures are still computed):';
    $('warnings').append(head, list(check.warnings.map((w, k) => `${k + 1}. ${w.message}`)));
  }
  if (source.kind === 'stored') {
    const a = document.createElement('a');
    a.href = `/v1/hulls/${encodeURIComponent(source.id)}/report`;
    a.textContent = 'Printable report of this hull (HTML, for print or PDF)';
    $('report-link').replaceChildren(a);
    $('report-link').hidden = false;
  }
  const range = defaultRange(p.lowestKeel, p.lowestDeck);
  $('draft-from').value = range.from;
  $('draft-step').value = range.step;
  $('draft-to').value = range.to;
  $('sheet-draft').value = range.mid;
  say(`Drawing ${h.name}…`);
  showSvg('lines-figure', await ask('lines', {}, { svg: true }));
  $('lines-section').hidden = false;
  await Promise.all([showHydrostatics(), showSheet()]);
  await prepareStability(range);
  say(`Showing ${h.name}.`);
}

function draftsQuery() {
  return { drafts: `${$('draft-from').value.trim()}:${$('draft-step').value.trim()}:${$('draft-to').value.trim()}`, density: $('density').value.trim() };
}

async function showHydrostatics() {
  $('drafts-problem').textContent = '';
  const q = draftsQuery();
  let table;
  try {
    table = await ask('hydrostatics', q);
  } catch (e) {
    $('drafts-problem').textContent = e.message;
    return;
  }
  const keys = Object.keys(FIELD_LABELS);
  const headRow = document.createElement('tr');
  for (const k of keys) {
    const th = document.createElement('th');
    th.scope = 'col';
    th.textContent = FIELD_LABELS[k][0];
    const unit = document.createElement('span');
    unit.className = 'unit';
    unit.textContent = FIELD_LABELS[k][1] || '–';
    th.append(unit);
    headRow.append(th);
  }
  $('hydro-table').tHead.replaceChildren(headRow);
  $('hydro-table').tBodies[0].replaceChildren(...table.rows.map((r) => {
    const tr = document.createElement('tr');
    keys.forEach((k, i) => {
      const c = document.createElement(i === 0 ? 'th' : 'td');
      if (i === 0) c.scope = 'row';
      c.dataset.field = k;
      c.textContent = cell(r[k], FIELD_LABELS[k][1]);
      tr.append(c);
    });
    return tr;
  }));
  $('hydro-section').hidden = false;
  const [curves, bonjean] = await Promise.all([ask('curves-of-form', q, { svg: true }), ask('bonjean', {}, { svg: true })]);
  showSvg('curves-figure', curves);
  showSvg('bonjean-figure', bonjean);
}

const SHEET_COLUMNS = [
  ['x', 'x', 'm'], ['lever', 'lever', 'm'], ['halfBreadth', 'y at WL', 'm'], ['area', 'area', 'm²'], ['multiplierText', 'SM', ''],
  ['areaSM', 'area × SM', 'm²'], ['areaSMLever', 'area × SM × lever', 'm³'], ['momentZSM', 'moment z × SM', 'm³'], ['ySM', 'y × SM', 'm'], ['y3SM', 'y³ × SM', 'm³'],
];

async function showSheet() {
  $('sheet-problem').textContent = '';
  const draft = $('sheet-draft').value.trim();
  let sheet;
  try {
    sheet = await ask('sheet', { draft, density: $('density').value.trim() });
  } catch (e) {
    $('sheet-problem').textContent = e.message;
    return;
  }
  const headRow = document.createElement('tr');
  for (const [, label, unit] of SHEET_COLUMNS) {
    const th = document.createElement('th');
    th.scope = 'col';
    th.textContent = label;
    const u = document.createElement('span');
    u.className = 'unit';
    u.textContent = unit || '–';
    th.append(u);
    headRow.append(th);
  }
  $('sheet-table').tHead.replaceChildren(headRow);
  const rows = sheet.stations.map((s) => {
    const tr = document.createElement('tr');
    SHEET_COLUMNS.forEach(([key, , unit], i) => {
      const c = document.createElement(i === 0 ? 'th' : 'td');
      if (i === 0) c.scope = 'row';
      c.dataset.field = key;
      c.textContent = key === 'multiplierText' ? s[key] : cell(s[key], unit);
      tr.append(c);
    });
    return tr;
  });
  const total = document.createElement('tr');
  SHEET_COLUMNS.forEach(([key, , unit], i) => {
    const c = document.createElement(i === 0 ? 'th' : 'td');
    if (i === 0) { c.scope = 'row'; c.textContent = 'sums'; } else c.textContent = key in sheet.totals ? cell(sheet.totals[key], unit) : '';
    total.append(c);
  });
  $('sheet-table').tBodies[0].replaceChildren(...rows, total);
  $('sheet-caption').textContent = `Simpson's rule along the length at draft ${sheet.draft} m: common factor h/3 = ${cell(sheet.commonFactor, 'm')} m, levers from amidships x = ${sheet.amidships} m`;
  const r = sheet.results;
  facts($('sheet-results'), [
    ['Volume', `${cell(r.volume, 'm³')} m³ (h/3 × Σ area × SM)`],
    ['Displacement', `${cell(r.displacement, 't')} t`],
    ['LCB', `x = ${cell(r.lcb, 'm')} m`],
    ['VCB (KB)', `${cell(r.vcb, 'm')} m`],
    ['Waterplane area', `${cell(r.waterplaneArea, 'm²')} m²`],
    ['LCF', `x = ${cell(r.lcf, 'm')} m`],
  ]);
  $('sheet-section').hidden = false;
  showSvg('areas-figure', await ask('sectional-areas', { draft }, { svg: true }));
}

/** A round number near v, for the first values of a form: two significant digits. */
const round2 = (v) => String(Number(v.toPrecision(2)));

/**
 * The stability forms of a hull: the displacement at the middle draft to start the
 * loading with (KG is left for the user: it is the loading's, not the hull's), and the
 * cross curves over the displacements of the table. Heeled work needs each station's
 * deck edge; where the offsets leave it unsaid the service says so and the sections
 * show that instead.
 */
async function prepareStability(range) {
  $('loading-problem').textContent = '';
  $('cross-problem').textContent = '';
  let rows;
  try {
    rows = (await ask('hydrostatics', { drafts: `${range.from}:${range.step}:${range.to}`, density: $('density').value.trim() })).rows;
  } catch {
    return;
  }
  const mid = rows.find((r) => String(r.draft) === range.mid) ?? rows[rows.length >> 1];
  $('load-displacement').value = round2(mid.displacement);
  $('load-kg').value = '';
  $('load-lcg').value = '';
  $('loading-results').replaceChildren();
  $('gz-figure').replaceChildren();
  $('criteria-table').tHead.replaceChildren();
  $('criteria-table').tBodies[0].replaceChildren();
  $('criteria-notes').replaceChildren();
  $('loading-section').hidden = false;
  const lo = rows[1]?.displacement ?? rows[0].displacement;
  const hi = rows[rows.length - 1].displacement;
  const step = roundStep(hi - lo);
  $('cross-from').value = trim(Math.ceil(lo / step) * step);
  $('cross-step').value = trim(step);
  $('cross-to').value = trim(Math.floor(hi / step) * step);
  $('cross-section').hidden = false;
  await showCrossCurves();
}

function loadingQuery() {
  const q = {
    displacement: $('load-displacement').value.trim(),
    kg: $('load-kg').value.trim(),
    fsm: $('load-fsm').value.trim(),
    trim: $('load-free').checked ? 'free' : 'level',
    density: $('density').value.trim(),
  };
  return q;
}

const CRITERION_NAMES = {
  'area-0-30': 'Area under GZ, 0° to 30°', 'area-0-40': 'Area under GZ, 0° to 40° or downflooding', 'area-30-40': 'Area under GZ, 30° to 40° or downflooding',
  'gz-at-30': 'GZ at 30° or more', 'angle-of-max-gz': 'Angle of the largest GZ', gm0: 'Initial GM (GM0)',
};
const UNIT_TEXT = { 'm.rad': 'm·rad', m: 'm', deg: '°' };

async function showLoading() {
  $('loading-problem').textContent = '';
  const q = loadingQuery();
  const lcg = $('load-lcg').value.trim();
  let gz;
  let floated = null;
  try {
    [gz, floated] = await Promise.all([
      ask('gz', q),
      lcg === '' ? null : ask('float', { displacement: q.displacement, lcg, kg: q.kg, density: q.density }),
    ]);
  } catch (e) {
    $('loading-problem').textContent = e.message;
    return;
  }
  const pairs = [
    ['KG with free surface', `${cell(gz.kgEffective, 'm')} m (KG ${cell(gz.kg, 'm')} m + FSM / displacement)`],
    ['GM0', `${cell(gz.gm0, 'm')} m (KMt at the level draft of the displacement − KG with free surface, as the criteria take it)`],
    ['Largest GZ', `${cell(gz.maxGz, 'm')} m at ${gz.angleOfMaxGz.toFixed(1)}°`],
    ['Angle of vanishing stability', gz.vanishingAngle === null ? 'beyond the curve worked' : `${gz.vanishingAngle.toFixed(1)}°`],
  ];
  if (gz.lollAngle !== null) pairs.push(['Angle of loll', `${gz.lollAngle.toFixed(1)}°: GM0 is below zero, so the vessel lolls to this angle to either side`]);
  if (floated !== null) {
    pairs.unshift(['Floats at', `draft aft ${cell(floated.draftAft, 'm')} m, forward ${cell(floated.draftFwd, 'm')} m, trim ${cell(floated.trim, 'm')} m by the ${floated.trim >= 0 ? 'stern' : 'head'}`]);
    if (floated.stable === false) {
      pairs.splice(1, 0, ['Unstable upright', `GM at that balance, at its trim and without free surface, is ${cell(floated.gm, 'm')} m: the vessel would not rest there but loll or capsize; read the GZ curve below`]);
    }
  }
  facts($('loading-results'), pairs);
  const headRow = document.createElement('tr');
  for (const label of ['Criterion', 'Required', 'Found', 'Verdict']) {
    const th = document.createElement('th');
    th.scope = 'col';
    th.textContent = label;
    headRow.append(th);
  }
  $('criteria-table').tHead.replaceChildren(headRow);
  $('criteria-table').tBodies[0].replaceChildren(...gz.criteria.map((c) => {
    const tr = document.createElement('tr');
    tr.dataset.criterion = c.id;
    const name = document.createElement('th');
    name.scope = 'row';
    name.textContent = CRITERION_NAMES[c.id] ?? c.id;
    const u = UNIT_TEXT[c.unit] ?? c.unit;
    const sep = u === '°' ? '' : ' ';
    const req = document.createElement('td');
    req.textContent = `at least ${c.required}${sep}${u}`;
    const act = document.createElement('td');
    act.textContent = `${Number(c.actual.toPrecision(4))}${sep}${u}`;
    const verdict = document.createElement('td');
    verdict.className = c.pass ? 'pass' : 'fail';
    verdict.textContent = c.pass ? 'pass' : 'FAIL';
    tr.append(name, req, act, verdict);
    return tr;
  }));
  $('criteria-caption').textContent = `Intact-stability criteria: ${gz.criteriaSet.name} (${gz.criteriaSet.source})`;
  $('criteria-notes').replaceChildren(list(gz.notes ?? [], 'notes'));
  showSvg('gz-figure', await ask('gz', q, { svg: true }));
}

function crossQuery() {
  return {
    displacements: `${$('cross-from').value.trim()}:${$('cross-step').value.trim()}:${$('cross-to').value.trim()}`,
    heels: $('cross-heels').value.trim(),
    trim: $('cross-free').checked ? 'free' : 'level',
    density: $('density').value.trim(),
  };
}

async function showCrossCurves() {
  $('cross-problem').textContent = '';
  try {
    showSvg('cross-figure', await ask('cross-curves', crossQuery(), { svg: true }));
  } catch (e) {
    $('cross-figure').replaceChildren();
    $('cross-problem').textContent = e.message;
  }
}

async function guarded(fn) {
  try {
    await fn();
  } catch (e) {
    say(`Something went wrong: ${e.message}`);
  }
}

async function loadList() {
  const res = await fetch('/v1/hulls', { headers: { accept: 'application/json' } });
  const { hulls } = await res.json();
  const select = $('hull-select');
  select.replaceChildren(...hulls.map((h) => {
    const o = document.createElement('option');
    o.value = h.id;
    o.textContent = h.name;
    return o;
  }));
  if (hulls.length === 0) {
    const o = document.createElement('option');
    o.value = '';
    o.textContent = 'no hull is stored yet';
    select.append(o);
  }
  return hulls;
}

async function readFile(file) {
  if (!file) return;
  source = { kind: 'file', name: file.name, text: await file.text() };
  await guarded(showHull);
}

function wire() {
  $('stored-form').addEventListener('submit', (ev) => {
    ev.preventDefault();
    const select = $('hull-select');
    if (select.value === '') return;
    source = { kind: 'stored', id: select.value, name: select.selectedOptions[0].textContent };
    guarded(showHull);
  });
  $('file-input').addEventListener('change', (ev) => readFile(ev.target.files[0]));
  const zone = $('drop-zone');
  zone.addEventListener('dragover', (ev) => {
    ev.preventDefault();
    zone.classList.add('over');
  });
  zone.addEventListener('dragleave', () => zone.classList.remove('over'));
  zone.addEventListener('drop', (ev) => {
    ev.preventDefault();
    zone.classList.remove('over');
    readFile(ev.dataTransfer?.files?.[0]);
  });
  $('drafts-form').addEventListener('submit', (ev) => {
    ev.preventDefault();
    guarded(showHydrostatics);
  });
  $('sheet-form').addEventListener('submit', (ev) => {
    ev.preventDefault();
    guarded(showSheet);
  });
  $('loading-form').addEventListener('submit', (ev) => {
    ev.preventDefault();
    guarded(showLoading);
  });
  $('cross-form').addEventListener('submit', (ev) => {
    ev.preventDefault();
    guarded(showCrossCurves);
  });
  $('download-gz-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-gz.csv`, await ask('gz', loadingQuery(), { csv: true }), 'text/csv')));
  $('download-cross-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-cross-curves.csv`, await ask('cross-curves', crossQuery(), { csv: true }), 'text/csv')));
  $('download-hydro-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-hydrostatics.csv`, await ask('hydrostatics', draftsQuery(), { csv: true }), 'text/csv')));
  $('download-bonjean-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-bonjean.csv`, await ask('bonjean', {}, { csv: true }), 'text/csv')));
  $('download-sheet-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-sheet.csv`, await ask('sheet', { draft: $('sheet-draft').value.trim(), density: $('density').value.trim() }, { csv: true }), 'text/csv')));
  $('download-areas-csv').addEventListener('click', () => guarded(async () => saveText(`${baseName()}-areas.csv`, await ask('areas', { draft: $('sheet-draft').value.trim() }, { csv: true }), 'text/csv')));
  for (const b of document.querySelectorAll('[data-download-svg]')) {
    b.addEventListener('click', () => {
      const text = svgs[b.dataset.downloadSvg];
      if (text) saveText(`${baseName()}-${b.dataset.filename}`, text, 'image/svg+xml');
    });
  }
}

wire();
guarded(async () => {
  const hulls = await loadList();
  // A first look without a click: the hull the address names (/?hull=<id>), else the
  // first stored hull (a demo hull on a new service).
  const named = new URLSearchParams(location.search).get('hull');
  const first = hulls.find((h) => h.id === named) ?? hulls[0];
  if (first !== undefined) {
    $('hull-select').value = first.id;
    source = { kind: 'stored', id: first.id, name: first.name };
    await showHull();
  } else say('No hull is stored: choose an offsets file.');
});
