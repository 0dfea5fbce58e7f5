// colloidtriage workbench. Builds the form from the OpenAPI document (ranges,
// enums, units, defaults) and the library listing, posts it to /v1/triage and
// renders the report. No dependencies; everything it loads comes from the
// service that served it.
"use strict";

// The form, grouped as a formulator thinks. Each field is [path, label] with
// an optional kind; the path is the request member in dots (array items by
// index). "more" fields fold away under the group.
const GROUPS = [
  {
    id: "product", title: "The product",
    fields: [
      ["sample_id", "Sample id"],
      ["product_category", "Product category"],
      ["particles.material", "Material", "material"],
      ["particles.phase", "Phase"],
      ["particles.diameter_nm", "Median diameter d50"],
      ["particles.size_span", "Size span (d90 − d10)/d50"],
      ["particles.volume_fraction", "Volume fraction"],
      ["particles.zeta_mV", "Zeta potential"],
    ],
    more: [
      ["particles.mobility_um_cm_per_V_s", "Electrophoretic mobility"],
      ["particles.density_kg_m3", "Particle density"],
      ["particles.isoelectric_ph", "Isoelectric point"],
      ["particles.hamaker_zJ", "Hamaker constant"],
      ["particles.refractive_index", "Refractive index"],
      ["particles.relative_permittivity", "Relative permittivity"],
      ["particles.solubility_mol_m3", "Solubility"],
      ["particles.molar_volume_cm3_mol", "Molar volume"],
      ["particles.interfacial_tension_mN_m", "Interfacial tension"],
    ],
  },
  {
    id: "liquid", title: "The liquid",
    fields: [
      ["medium.liquid", "Liquid", "liquid"],
      ["medium.temperature_c", "Temperature"],
      ["medium.ph", "pH"],
      ["salts", "Salts", "salts"],
      ["medium.ionic_strength_mM", "Ionic strength (instead of salts)"],
      ["medium.conductivity_uS_cm", "Conductivity (estimate)"],
      ["medium.hardness.value", "Water hardness"],
      ["medium.hardness.unit", "Hardness unit"],
      ["medium.cosolvents.0.name", "Co-solvent"],
      ["medium.cosolvents.0.mass_fraction", "Co-solvent mass fraction"],
    ],
    more: [
      ["medium.density_kg_m3", "Liquid density"],
      ["medium.viscosity_mPa_s", "Liquid viscosity"],
      ["medium.relative_permittivity", "Relative permittivity"],
      ["medium.refractive_index", "Refractive index"],
      ["medium.yield_stress_Pa", "Yield stress"],
    ],
  },
  {
    id: "stabiliser", title: "Stabilisers and polymers",
    fields: [
      ["stabilizer.layer_thickness_nm", "Steric layer thickness"],
      ["stabilizer.solvent_quality", "Solvent quality for the layer"],
      ["stabilizer.cloud_point_c", "Cloud point"],
      ["stabilizer.adsorbing_polymer.molar_mass_kg_mol", "Adsorbing polymer molar mass"],
      ["stabilizer.adsorbing_polymer.surface_coverage", "Adsorbing polymer coverage"],
      ["medium.free_polymer.concentration_g_L", "Free polymer concentration"],
      ["medium.free_polymer.radius_of_gyration_nm", "Free polymer radius of gyration"],
      ["medium.free_polymer.molar_mass_kg_mol", "Free polymer molar mass"],
    ],
    more: [["stabilizer.flory_huggins_chi", "Flory–Huggins χ"]],
  },
  {
    id: "storage", title: "Storage and shelf life",
    fields: [
      ["storage.container_height_mm", "Fill height"],
      ["storage.shelf_life_days", "Shelf life"],
      ["storage.min_temperature_c", "Lowest temperature"],
      ["storage.max_temperature_c", "Highest temperature"],
      ["storage.freeze_thaw_cycles", "Freeze–thaw cycles"],
      ["storage.process_step", "Process step"],
      ["storage.shear_rate_per_s", "Shear rate"],
      ["storage.max_clear_layer_mm", "Largest clear layer allowed"],
    ],
    more: [["storage.temperature_c", "Storage temperature"]],
  },
  {
    id: "observed", title: "What was observed",
    fields: [
      ["symptom", "Symptom"],
      ["observation.age_days", "Age when seen"],
      ["observation.clear_layer_mm", "Clear or cream layer"],
      ["observation.sediment_redisperses", "Sediment redisperses"],
      ["observation.size_growth_percent", "Growth of the median size"],
      ["observation.viscosity_change_percent", "Change of viscosity"],
      ["observations", "Series over time", "observations"],
    ],
  },
  {
    id: "constraints", title: "What the product cannot change", folded: true,
    fields: [["constraints", "Fixed inputs (remedies that change one are withheld)", "multi"]],
  },
  {
    id: "criteria", title: "Acceptance criteria and models", folded: true,
    fields: [
      ["criteria.min_barrier_kT", "Least energy barrier"],
      ["criteria.half_life_to_shelf_life", "Half-life over shelf life"],
      ["criteria.max_relative_viscosity", "Largest relative viscosity"],
      ["criteria.max_steric_contact_kT", "Largest steric contact energy"],
      ["models.van_der_waals", "Van der Waals model"],
      ["models.double_layer", "Double-layer model"],
      ["models.zeta_from_mobility", "Zeta from mobility"],
    ],
  },
];

const UNITS = {
  "1": "", degC: "°C", "kg/m^3": "kg/m³", "mPa s": "mPa·s", "uS/cm": "µS/cm", "cm^3/mol": "cm³/mol",
  "um cm/(V s)": "µm·cm/(V·s)", "mol/m^3": "mol/m³", d: "days", "1/s": "1/s",
};

const $ = (sel) => document.querySelector(sel);
let openapi = null;
let library = { materials: [], liquids: [] };
let extras = {}; // loaded request members the form has no field for, kept as they were
let lastReport = null;
let saltRows = 0;
let obsRows = 0;

// The columns of the observations series, in the order of the table.
const OBS_COLUMNS = [
  ["age_days", "Age"], ["clear_layer_mm", "Clear layer"], ["median_diameter_nm", "d50"],
  ["viscosity_mPa_s", "Viscosity"], ["sediment_redisperses", "Redisperses"],
];

// h builds an element: h("p", {class: "x"}, "text", child, ...). Text is
// always set as text, never parsed as markup.
function h(tag, attrs, ...kids) {
  const el = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs || {})) {
    if (v === undefined || v === null || v === false) continue;
    if (k === "class") el.className = v;
    else if (k.startsWith("on")) el.addEventListener(k.slice(2), v);
    else el.setAttribute(k, v === true ? "" : v);
  }
  for (const kid of kids.flat(Infinity)) {
    if (kid === undefined || kid === null || kid === false) continue;
    el.append(kid instanceof Node ? kid : String(kid));
  }
  return el;
}

function status(text) { $("#status").textContent = text; }

function apiHeaders(extra) {
  const hdr = Object.assign({}, extra);
  const key = $("#api-key").value.trim();
  if (key) hdr["X-API-Key"] = key;
  return hdr;
}

// ---- the contract ----

function deref(s) {
  while (s && s.$ref) s = openapi.components.schemas[s.$ref.split("/").pop()];
  if (s && s.allOf) {
    const merged = { properties: {} };
    for (const part of s.allOf.map(deref)) {
      Object.assign(merged.properties, part.properties || {});
      for (const [k, v] of Object.entries(part)) if (k !== "properties" && !(k in merged)) merged[k] = v;
    }
    return merged;
  }
  return s;
}

// schemaAt returns the schema of a request member by its dotted path.
function schemaAt(path) {
  let s = deref(openapi.components.schemas.Sample);
  for (const seg of path.split(".")) {
    if (!s) return null;
    s = /^\d+$/.test(seg) ? deref(s.items) : deref((s.properties || {})[seg]);
  }
  return s;
}

function unitText(s) {
  const u = s && s["x-unit"];
  if (u === "hardness.unit") return "unit below";
  return u === undefined ? "" : (u in UNITS ? UNITS[u] : u);
}

// bound prints a range limit briefly (1e+7 as 1e7).
const bound = (v) => (Math.abs(v) >= 1e5 ? v.toExponential().replace("e+", "e") : String(v));

// rangeText states a field's valid range; OpenAPI 3.0 marks an exclusive
// limit with a boolean beside minimum or maximum, 3.1 with a number.
function rangeText(s) {
  if (!s) return "";
  const limit = (value, exclusive, sign) => {
    if (typeof exclusive === "number") return `${sign} ${bound(exclusive)}`;
    if (value === undefined) return "";
    return exclusive ? `${sign} ${bound(value)}` : bound(value);
  };
  const lo = limit(s.minimum, s.exclusiveMinimum, ">");
  const hi = limit(s.maximum, s.exclusiveMaximum, "<");
  if (lo && hi) return `${lo} to ${hi}`;
  return lo ? `from ${lo}` : (hi ? `up to ${hi}` : "");
}

const fieldId = (path) => "f-" + path.replace(/\./g, "-");

// ---- the form ----

function control(path, kind, s) {
  const id = fieldId(path);
  const common = { id, "data-path": path, "aria-describedby": `${id}-unit ${id}-err` };
  if (kind === "material" || kind === "liquid") {
    const items = kind === "material" ? library.materials : library.liquids;
    return h("select", common,
      h("option", { value: "" }, kind === "material" ? "— own values —" : "— default (water) —"),
      items.map((m) => h("option", { value: m.key }, `${m.name} (${m.key})`)));
  }
  if (kind === "multi") {
    const values = (s && s.items && s.items.enum) || [];
    return h("select", Object.assign({ multiple: true, size: 6, "data-type": "list" }, common),
      values.map((v) => h("option", { value: v }, v.replace(/_/g, " "))));
  }
  if (s && s.enum) {
    const def = s.default !== undefined ? ` (default ${s.default})` : "";
    return h("select", common, h("option", { value: "" }, `— not given${def} —`),
      s.enum.map((v) => h("option", { value: v }, v.replace(/_/g, " "))));
  }
  if (s && s.type === "boolean") {
    return h("select", Object.assign({ "data-type": "boolean" }, common),
      h("option", { value: "" }, "— not known —"), h("option", { value: "true" }, "yes"), h("option", { value: "false" }, "no"));
  }
  const numeric = s && (s.type === "number" || s.type === "integer");
  return h("input", Object.assign({
    type: "text", inputmode: numeric ? "decimal" : "text", autocomplete: "off", spellcheck: "false",
    "data-type": numeric ? "number" : "string",
    placeholder: s && s.default !== undefined ? `default ${s.default}` : "",
    maxlength: s && s.maxLength,
  }, common));
}

function field(path, label, kind) {
  const s = schemaAt(path);
  const id = fieldId(path);
  const range = rangeText(s);
  const desc = s && s.description ? s.description.replace(/\s+/g, " ").replace(/ Unit: .*$/, "") : "";
  return h("div", { class: "field", "data-field": path, title: desc || null },
    h("label", { for: id }, label, s && s.required ? " *" : ""),
    control(path, kind, s),
    h("span", { class: "unit", id: `${id}-unit` }, s && s["x-unit"] === "1" ? "(ratio)" : unitText(s)),
    range ? h("span", { class: "hint" }, `valid ${range}`) : null,
    h("p", { class: "err", id: `${id}-err` }));
}

function saltRow() {
  const i = saltRows++;
  const p = `medium.electrolytes.${i}`;
  const row = h("div", { class: "salt", "data-salt": i },
    h("div", { class: "salt-head" }, `Salt ${i + 1}`,
      h("button", { type: "button", class: "small", "aria-label": `Remove salt ${i + 1}`, onclick: () => { row.remove(); renumberSalts(); saveState(); } }, "Remove")),
    field(`${p}.formula`, "Formula (NaCl, CaCl2, …)"),
    field(`${p}.concentration_mM`, "Concentration"));
  return row;
}

// renumberSalts keeps the salt rows' paths consecutive after one is removed.
function renumberSalts() {
  const rows = [...document.querySelectorAll("[data-salt]")];
  saltRows = 0;
  for (const row of rows) {
    const values = [...row.querySelectorAll("[data-path]")].map((el) => el.value);
    const fresh = saltRow();
    [...fresh.querySelectorAll("[data-path]")].forEach((el, k) => { el.value = values[k]; });
    row.replaceWith(fresh);
  }
}

function saltsBlock() {
  const list = h("div", { id: "salts" });
  return h("div", { class: "salts" }, list,
    h("button", { type: "button", class: "small", id: "add-salt", onclick: () => { list.append(saltRow()); list.lastChild.querySelector("input").focus(); } }, "Add a salt"));
}

function obsRow() {
  const i = obsRows++;
  const cell = ([key, label]) => {
    const path = `observations.${i}.${key}`;
    const s = schemaAt(path);
    const id = fieldId(path);
    return h("td", { class: "field cell", "data-field": path },
      h("label", { for: id, class: "visually-hidden" }, `${label}, inspection ${i + 1}`),
      control(path, null, s), h("span", { class: "visually-hidden", id: `${id}-unit` }, unitText(s)),
      h("p", { class: "err", id: `${id}-err` }));
  };
  const row = h("tr", { "data-obs": i }, OBS_COLUMNS.map(cell),
    h("td", {}, h("button", { type: "button", class: "small", "aria-label": `Remove inspection ${i + 1}`, onclick: () => { row.remove(); renumberObs(); saveState(); } }, "×")));
  return row;
}

// renumberObs keeps the inspections' paths consecutive after one is removed.
function renumberObs() {
  const rows = [...document.querySelectorAll("[data-obs]")];
  obsRows = 0;
  for (const row of rows) {
    const values = [...row.querySelectorAll("[data-path]")].map((el) => el.value);
    const fresh = obsRow();
    [...fresh.querySelectorAll("[data-path]")].forEach((el, k) => { el.value = values[k]; });
    row.replaceWith(fresh);
  }
}

function observationsBlock(label) {
  const body = h("tbody", { id: "observations" });
  const head = OBS_COLUMNS.map(([key, text]) => {
    const u = unitText(schemaAt(`observations.0.${key}`));
    return h("th", { scope: "col" }, text, u ? h("span", { class: "unit" }, ` ${u}`) : null);
  });
  return h("div", { class: "obs" },
    h("div", { class: "obs-head" }, label, h("span", { class: "hint" }, " three ages or more give a trend")),
    h("table", { class: "obs-table" }, h("thead", {}, h("tr", {}, head, h("th", {}, h("span", { class: "visually-hidden" }, "Remove")))), body),
    h("button", { type: "button", class: "small", id: "add-obs", onclick: () => { body.append(obsRow()); body.lastChild.querySelector("input").focus(); } }, "Add an inspection"));
}

function buildForm() {
  const groups = $("#groups");
  groups.replaceChildren();
  saltRows = 0;
  obsRows = 0;
  for (const g of GROUPS) {
    const make = ([path, label, kind]) => {
      if (kind === "salts") return saltsBlock();
      if (kind === "observations") return observationsBlock(label);
      return field(path, label, kind);
    };
    const body = [g.fields.map(make)];
    if (g.more) body.push(h("details", { class: "more" }, h("summary", {}, "More"), g.more.map(make)));
    const fs = h("fieldset", { class: "group", id: `group-${g.id}` }, h("legend", {}, g.title), body);
    groups.append(g.folded ? h("details", { class: "more" }, h("summary", {}, g.title), fs) : fs);
  }
  $("#salts").append(saltRow());
}

function typed(el) {
  if (el.dataset.type === "list") {
    const picked = [...el.selectedOptions].map((o) => o.value);
    return picked.length ? picked : undefined;
  }
  const raw = el.value.trim();
  if (raw === "") return undefined;
  if (el.dataset.type === "boolean") return raw === "true";
  if (el.dataset.type === "number") {
    const norm = raw.replace(/\u2212/g, "-").replace(/,/g, ".");
    // A value that is not a number goes as typed, so that the service names the field.
    return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(norm) ? Number(norm) : raw;
  }
  return raw;
}

function setPath(obj, path, value) {
  const segs = path.split(".");
  let o = obj;
  segs.forEach((seg, i) => {
    const last = i === segs.length - 1;
    const key = /^\d+$/.test(seg) ? Number(seg) : seg;
    if (last) { o[key] = value; return; }
    if (o[key] === undefined) o[key] = /^\d+$/.test(segs[i + 1]) ? [] : {};
    o = o[key];
  });
}

function merge(into, from) {
  for (const [k, v] of Object.entries(from)) {
    if (v && typeof v === "object" && !Array.isArray(v) && into[k] && typeof into[k] === "object") merge(into[k], v);
    else if (!(k in into)) into[k] = v;
  }
  return into;
}

// collect reads the form into a request.
function collect() {
  const req = {};
  for (const el of document.querySelectorAll("#groups [data-path]")) {
    const v = typed(el);
    if (v !== undefined) setPath(req, el.dataset.path, v);
  }
  if (req.medium && req.medium.electrolytes) {
    req.medium.electrolytes = req.medium.electrolytes.filter(Boolean);
    if (!req.medium.electrolytes.length) delete req.medium.electrolytes;
  }
  if (req.observations) {
    req.observations = req.observations.filter(Boolean);
    if (!req.observations.length) delete req.observations;
  }
  return merge(req, JSON.parse(JSON.stringify(extras)));
}

function leaves(obj, prefix, out) {
  for (const [k, v] of Object.entries(obj)) {
    const p = prefix ? `${prefix}.${k}` : k;
    if (v && typeof v === "object") leaves(v, p, out);
    else out.push([p, v]);
  }
  return out;
}

// fill puts a request into the form; members without a field are kept aside
// and sent as they were.
function fill(req) {
  buildForm();
  extras = {};
  const salts = (req.medium && req.medium.electrolytes) || [];
  for (let i = 1; i < salts.length; i++) $("#salts").append(saltRow());
  for (let i = 0; i < (req.observations || []).length; i++) $("#observations").append(obsRow());
  const kept = [];
  const rest = Object.assign({}, req);
  const fixed = $("#groups [data-path=constraints]");
  if (Array.isArray(req.constraints) && req.constraints.every((c) => [...fixed.options].some((o) => o.value === c))) {
    for (const o of fixed.options) o.selected = req.constraints.includes(o.value);
    if (req.constraints.length) fixed.closest("details").open = true;
    delete rest.constraints;
  }
  for (const [path, v] of leaves(rest, "", [])) {
    const el = document.querySelector(`#groups [data-path="${CSS.escape(path)}"]`);
    if (el && (v === null || typeof v !== "object")) {
      if (el.tagName === "SELECT" && v !== null && ![...el.options].some((o) => o.value === String(v))) {
        el.append(h("option", { value: String(v) }, String(v)));
      }
      el.value = v === null ? "" : String(v);
      const more = el.closest("details");
      if (more && el.value !== "") more.open = true;
    } else {
      setPath(extras, path, v);
      kept.push(path);
    }
  }
  if (kept.length) status(`Kept as loaded (no field on the form): ${kept.join(", ")}`);
}

// ---- the URL holds the request ----

function toBase64url(text) {
  const bytes = new TextEncoder().encode(text);
  let bin = "";
  bytes.forEach((b) => { bin += String.fromCharCode(b); });
  return btoa(bin).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64url(s) {
  const bin = atob(s.replace(/-/g, "+").replace(/_/g, "/"));
  return new TextDecoder().decode(Uint8Array.from(bin, (c) => c.charCodeAt(0)));
}

function saveState() {
  const req = collect();
  const json = JSON.stringify(req, null, 2);
  $("#request-text").value = json;
  const frag = Object.keys(req).length ? "#request=" + toBase64url(JSON.stringify(req)) : " ";
  history.replaceState(null, "", frag === " " ? location.pathname : frag);
}

function stateFromURL() {
  const m = location.hash.match(/^#request=([A-Za-z0-9_-]+)$/);
  if (!m) return null;
  try { return JSON.parse(fromBase64url(m[1])); } catch { status("The link's request could not be read."); return null; }
}

// ---- copy and load ----

async function copy(text, what) {
  $("#request-panel").open = true;
  $("#request-text").value = text;
  try {
    await navigator.clipboard.writeText(text);
    status(`${what} copied to the clipboard.`);
  } catch {
    $("#request-text").select();
    status(`${what} is in the Request box below; copy it from there.`);
  }
}

function curlText(req) {
  const key = $("#api-key").value.trim() ? ` \\\n  -H "X-API-Key: $COLLOIDTRIAGE_API_KEY"` : "";
  return `curl -sS -X POST ${location.origin}/v1/triage \\\n  -H 'Content-Type: application/json'${key} \\\n  --data-binary @- <<'JSON'\n${JSON.stringify(req, null, 2)}\nJSON\n`;
}

function loadText(text) {
  $("#load-error").textContent = "";
  let req;
  try { req = JSON.parse(text); } catch (e) {
    $("#load-error").textContent = `Not JSON: ${e.message}`;
    return;
  }
  if (!req || typeof req !== "object" || Array.isArray(req)) {
    $("#load-error").textContent = "A request is one JSON object (one sample).";
    return;
  }
  fill(req);
  saveState();
  $("#load-panel").open = false;
  status("Request loaded into the form.");
}

// ---- problems next to their fields ----

function clearProblems() {
  $("#problems").hidden = true;
  $("#problems").replaceChildren();
  for (const f of document.querySelectorAll(".field.invalid")) f.classList.remove("invalid");
  for (const el of document.querySelectorAll("[aria-invalid]")) el.removeAttribute("aria-invalid");
  for (const el of document.querySelectorAll(".field .err")) el.textContent = "";
  $("#reference-err").textContent = "";
}

function problemText(e) {
  const u = e.unit ? unit(e.unit) : "";
  return e.valid ? `${e.reason}; valid: ${e.valid}${u ? ` ${u}` : ""}` : e.reason;
}

// showProblem marks each field a problem names. From the compare route the
// complaint's pointers (/complaint/...) name the form's fields and the
// reference's (/reference/...) are listed beside the reference box.
function showProblem(p, compared) {
  clearProblems();
  const list = h("ul");
  const onReference = [];
  let first = null;
  for (const e of p.errors || []) {
    let pointer = e.pointer || "";
    if (compared && pointer.startsWith("/reference")) {
      onReference.push(`${pointer.replace(/^\/reference/, "") || "the reference"}: ${problemText(e)}`);
      list.append(h("li", {}, `reference ${pointer.replace(/^\/reference/, "")}: ${problemText(e)}`));
      continue;
    }
    if (compared) pointer = pointer.replace(/^\/complaint/, "");
    const path = pointer.replace(/^\//, "").split("/").join(".");
    const el = path && document.querySelector(`#groups [data-path="${CSS.escape(path)}"]`);
    if (el) {
      const fieldEl = el.closest(".field");
      fieldEl.classList.add("invalid");
      el.setAttribute("aria-invalid", "true");
      fieldEl.querySelector(".err").textContent = problemText(e);
      for (let d = el.closest("details"); d; d = d.parentElement.closest("details")) d.open = true;
      first = first || el;
      list.append(h("li", {}, h("a", { href: `#${el.id}`, onclick: (ev) => { ev.preventDefault(); el.focus(); } }, e.pointer), `: ${problemText(e)}`));
    } else {
      list.append(h("li", {}, `${e.pointer || "request"}: ${problemText(e)}`));
    }
  }
  if (onReference.length) {
    $("#reference-err").textContent = `In the reference: ${onReference.join("; ")}`;
    $("#compare-panel").open = true;
  }
  $("#problems").append(h("h3", {}, p.title || "The request was refused"), p.detail ? h("p", {}, p.detail) : null, list);
  $("#problems").hidden = false;
  if (first) first.focus();
}

// ---- the report ----

function fmt(v) {
  if (typeof v !== "number") return String(v);
  if (v === 0) return "0";
  const a = Math.abs(v);
  const s = a >= 1e-3 && a < 1e6 ? String(Number(v.toPrecision(3))) : v.toExponential(2).replace("e+", "e");
  return s.replace(/^-/, "−");
}

const human = (id) => id.replace(/_/g, " ");
const unit = (u) => (u in UNITS ? UNITS[u] : u || "");
const pct = (p) => `${Math.round(p * 100)} %`;

function targetText(t) {
  return `${t.quantity} ${t.op} ${fmt(t.value)} ${unit(t.unit)}`;
}

function remedyItem(r) {
  const feasible = r.feasible !== undefined ? r.feasible : (r.target && r.target.feasible);
  const reason = r.reason || (r.target && r.target.reason);
  const iv = r.target && r.target.interval;
  return h("li", { class: feasible === false ? "infeasible" : "", "data-remedy": r.id },
    feasible === false ? h("span", { class: "badge bad" }, "not feasible") : null, " ",
    r.action, " ",
    r.target ? h("span", { class: "target" }, targetText(r.target)) : null,
    iv ? h("span", { class: "hint" }, ` (over the inputs' uncertainty ${fmt(iv.low)} to ${fmt(iv.high)})`) : null,
    feasible === false && reason ? h("span", { class: "criterion" }, `Why not: ${reason}`) : null,
    r.criterion ? h("span", { class: "criterion" }, `Criterion: ${r.criterion}`) : null);
}

function causeCard(c) {
  const head = h("div", { class: "cause-head" },
    h("h3", {}, `${c.rank}. ${c.title}`),
    c.probability !== undefined
      ? h("span", { class: "badge", title: "share of the uncertainty draws in which this cause ranks first" }, `probability ${pct(c.probability)}`)
      : null,
    h("span", { class: "score", title: "combined certainty factor of the supporting rules" },
      h("span", { class: "bar", "aria-hidden": "true" }, h("span", { style: null })), ` score ${fmt(c.score)}`),
    c.support !== undefined ? h("span", { class: "hint" }, `support ${pct(c.support)}`) : null);
  head.querySelector(".bar > span").style.width = `${Math.round(c.score * 100)}%`;
  const ev = (c.evidence || []).length
    ? h("table", { class: "evidence" }, h("thead", {}, h("tr", {}, h("th", {}, "Evidence"), h("th", {}, "Value"))),
      h("tbody", {}, c.evidence.map((e) => h("tr", { title: e.test || "" }, h("td", {}, human(e.scale)),
        h("td", { class: "num" }, `${fmt(e.value)} ${unit(e.unit)}`)))))
    : null;
  const remedies = (c.remedies || []).length ? [h("h4", { class: "visually-hidden" }, "Remedies"), h("ul", { class: "remedies" }, c.remedies.map(remedyItem))] : null;
  const withheld = (c.withheld || []).length
    ? h("p", { class: "withheld" }, "Withheld by the constraints: ",
      c.withheld.map((w, i) => [i ? "; " : "", h("b", {}, human(w.id)), ` (would change ${w.constraints.join(", ")})`]))
    : null;
  return h("li", { class: `cause rank-${c.rank}${c.rank > 1 ? " minor" : ""}`, "data-cause": c.id },
    head, h("p", { class: "explanation" }, c.explanation), ev, remedies, withheld);
}

function consistencySection(rows) {
  return h("div", { class: "section" }, h("h3", {}, "Observations against the prediction"),
    h("table", {}, h("thead", {}, h("tr", {}, ["Observable", "Observed", "Predicted", "Verdict"].map((t) => h("th", {}, t)))),
      h("tbody", {}, rows.map((r) => {
        const u = unit(r.unit);
        const p = r.predicted || {};
        const range = p.low !== undefined ? ` (${fmt(p.low)} to ${fmt(p.high)})` : "";
        const good = /^(consistent|agree|within)/i.test(r.verdict || "");
        return h("tr", {}, h("td", {}, human(r.observable || "")), h("td", { class: "num" }, `${fmt(r.observed)} ${u}`),
          h("td", { class: "num" }, `${p.value !== undefined ? fmt(p.value) : "–"} ${u}${range}`),
          h("td", { class: good ? "verdict-ok" : "verdict-bad" }, human(r.verdict || "")));
      }))));
}

function trendsSection(trends) {
  const param = (q) => `${q.name} ${fmt(q.value)} ${unit(q.unit)} (${fmt(q.low)} to ${fmt(q.high)})`;
  return h("div", { class: "section trends", id: "trends" }, h("h3", {}, "Trends over the inspections"),
    trends.map((t) => h("div", { class: "trend", "data-trend": t.quantity },
      h("p", {}, h("b", {}, human(t.quantity)), ` (${t.points} inspections): `, h("span", { class: "badge" }, human(t.shape)), " ", t.says),
      (t.fits || []).length ? h("table", {}, h("thead", {}, h("tr", {}, ["Form", "Parameters (95 %)", "R²", "RMS residual"].map((x) => h("th", {}, x)))),
        h("tbody", {}, t.fits.map((f) => h("tr", {}, h("td", {}, f.form), h("td", {}, (f.parameters || []).map(param).join("; ")),
          h("td", { class: "num" }, fmt(f.r_squared)), h("td", { class: "num" }, fmt(f.rms_residual)))))) : null)));
}

function renderReport(rep) {
  lastReport = rep;
  const when = new Date().toLocaleString("sv-SE").slice(0, 16);
  const v = rep.versions || {};
  const meta = h("div", { class: "meta" },
    h("span", {}, "Sample ", h("b", {}, rep.sample_id || "(no id)")),
    h("span", {}, "Symptom ", h("b", {}, human(rep.symptom))),
    h("span", {}, "Date ", h("b", {}, when)),
    h("span", {}, "Engine ", h("b", {}, v.engine || "?")),
    h("span", {}, "Rules ", h("b", { class: "screen-only", title: v.rules }, (v.rules || "?").slice(0, 19)), h("b", { class: "print-only" }, v.rules || "?")),
    rep.request_id ? h("span", { class: "no-print" }, "Request ", h("b", {}, rep.request_id)) : null);
  const parts = [h("h2", { class: "print-only" }, "colloidtriage report"), meta];
  parts.push(h("h3", {}, "Causes, most likely first"));
  parts.push(rep.causes && rep.causes.length ? h("ol", { class: "causes", id: "causes" }, rep.causes.map(causeCard))
    : h("p", {}, "No cause fired for this symptom."));
  if (rep.measure_next && rep.measure_next.length) {
    parts.push(h("div", { class: "section" }, h("h3", {}, "What to measure next"),
      h("ul", {}, rep.measure_next.map((m) => h("li", {}, h("b", {}, m.input), m.share !== undefined ? ` (${pct(m.share)} of the doubt)` : "", m.how ? `: ${m.how}` : "")))));
  }
  if (rep.consistency && rep.consistency.length) parts.push(consistencySection(rep.consistency));
  if (rep.trends && rep.trends.length) parts.push(trendsSection(rep.trends));
  if (rep.ruled_out && rep.ruled_out.length) {
    parts.push(h("div", { class: "section ruled-out" }, h("h3", {}, "Ruled out"),
      h("ul", {}, rep.ruled_out.map((r) => h("li", {}, h("b", {}, human(r.id)), `: ${r.reason}`,
        r.scale ? ` (${human(r.scale)} ${fmt(r.value)} ${unit(r.unit)})` : "")))));
  }
  parts.push(h("div", { class: "section chart", id: "chart" }, h("h3", {}, "Interaction energy"), h("p", { class: "hint" }, "Drawing the chart…")));
  if (rep.cautions && rep.cautions.length) {
    parts.push(h("div", { class: "section cautions" }, h("h3", {}, "Cautions"), h("ul", {}, rep.cautions.map((c) => h("li", {}, c)))));
  }
  parts.push(h("details", { class: "fold" }, h("summary", {}, `Assumptions (${(rep.assumptions || []).length})`),
    h("ul", {}, (rep.assumptions || []).map((a) => h("li", {}, a))),
    h("h4", {}, "Models"), h("ul", {}, Object.entries(rep.models || {}).map(([k, m]) => h("li", {}, `${human(k)}: ${m}`)))));
  parts.push(h("details", { class: "fold" }, h("summary", {}, `All computed scales (${Object.keys(rep.scales || {}).length})`),
    h("table", {}, h("tbody", {}, Object.entries(rep.scales || {}).map(([k, s]) =>
      h("tr", {}, h("td", {}, human(k)), h("td", { class: "num" }, `${fmt(s.value)} ${unit(s.unit)}`), h("td", { class: "hint" }, s.basis)))))));
  parts.push(h("p", { class: "print-only" }, "This report aids qualified staff. It does not replace stability testing, and it defers to safety data sheets, local codes and regulations, and licensed professional practice."));
  $("#answer").replaceChildren(...parts);
  $("#print").disabled = false;
}

async function drawChart(body) {
  const box = $("#chart");
  try {
    const res = await fetch("/v1/interaction-profile", { method: "POST", body, headers: apiHeaders({ "Content-Type": "application/json", Accept: "image/svg+xml" }) });
    if (!res.ok) {
      const p = await res.json().catch(() => ({}));
      const why = (p.errors && p.errors[0] && p.errors[0].reason) || p.detail || p.title || res.statusText;
      box.replaceChildren(h("h3", {}, "Interaction energy"), h("p", { class: "hint" }, `No chart for this sample: ${why}.`));
      return;
    }
    const url = URL.createObjectURL(await res.blob());
    box.replaceChildren(h("h3", {}, "Interaction energy"),
      h("img", { src: url, alt: "Interaction energy of two median particles against their separation: total, van der Waals and double-layer parts, with the barrier and the secondary minimum marked." }));
  } catch (e) {
    box.replaceChildren(h("h3", {}, "Interaction energy"), h("p", { class: "hint" }, `No chart: ${e.message}`));
  }
}

async function triage(ev) {
  if (ev) ev.preventDefault();
  saveState();
  const body = JSON.stringify(collect());
  status("Triaging…");
  $("#submit").disabled = true;
  try {
    const res = await fetch("/v1/triage", { method: "POST", body, headers: apiHeaders({ "Content-Type": "application/json" }) });
    const data = await res.json().catch(() => ({ title: `HTTP ${res.status}` }));
    if (!res.ok) {
      showProblem(data);
      $("#answer").replaceChildren(h("p", { class: "placeholder" }, "No report: correct the fields marked in the form and press Triage again."));
      $("#print").disabled = true;
      status(`Refused: ${data.title || res.status}`);
      return;
    }
    clearProblems();
    renderReport(data);
    status(data.causes && data.causes.length ? `Top cause: ${data.causes[0].title}` : "No cause fired.");
    if (ev) $("#report").focus();
    await drawChart(body);
  } catch (e) {
    status(`The service did not answer: ${e.message}`);
  } finally {
    $("#submit").disabled = false;
  }
}

// ---- compare with a reference batch ----

// shown prints a compared value briefly: objects as JSON without quotes.
const shown = (v) => (v === null || v === undefined ? "absent" : typeof v === "object" ? JSON.stringify(v).replace(/"/g, "").replace(/,/g, ", ") : fmt(v));
const shareText = (x) => (x === undefined ? "–" : `${Math.round(x * 100)} %`);

function compareSection(c) {
  const scales = c.scales || [];
  const key = c.key_scale;
  const order = [...scales].sort((a, b) => (b.scale === key) - (a.scale === key));
  const scaleHead = (s) => h("th", { scope: "col", class: s.scale === key ? "key" : null }, human(s.scale), h("span", { class: "unit" }, ` ${unit(s.unit)}`));
  const effect = (effects, s) => h("td", { class: `num${s.scale === key ? " key" : ""}` }, effects && effects[s.scale] !== undefined ? fmt(effects[s.scale]) : "–");
  const diffs = h("table", { class: "differences", id: "differences" },
    h("caption", {}, "Each difference swapped alone from the reference into it: the change of each scale"),
    h("thead", {}, h("tr", {}, h("th", { scope: "col" }, "#"), h("th", { scope: "col" }, "Input"), h("th", { scope: "col" }, "Reference → complaint"),
      h("th", { scope: "col" }, "Share"), order.map(scaleHead))),
    h("tbody", {}, (c.differences || []).map((d) => h("tr", { "data-path": d.path },
      h("td", { class: "num" }, d.rank), h("td", { class: "path" }, h("code", {}, d.path)),
      h("td", { class: "values" }, `${shown(d.reference)} → ${shown(d.complaint)}`, d.problem ? h("span", { class: "criterion" }, d.problem) : null),
      h("td", { class: "num key" }, shareText(d.share)), order.map((s) => effect(d.effects, s))))));
  const pairs = (c.pairs || []).length
    ? [h("h4", {}, "Differences swapped two by two"),
      h("table", { class: "pairs", id: "pairs" },
        h("thead", {}, h("tr", {}, ["Pair", "Share", `Interaction on ${human(key || "")}`, `Joint change of ${human(key || "")}`].map((t) => h("th", { scope: "col" }, t)))),
        h("tbody", {}, c.pairs.map((p) => h("tr", {}, h("td", {}, p.paths.map((x) => h("code", {}, x)).flatMap((x, i) => (i ? [" + ", x] : [x]))),
          h("td", { class: "num" }, shareText(p.share)),
          h("td", { class: "num" }, p.interaction && p.interaction[key] !== undefined ? fmt(p.interaction[key]) : "–"),
          h("td", { class: "num" }, p.effects && p.effects[key] !== undefined ? fmt(p.effects[key]) : (p.problem || "–"))))))]
    : null;
  return h("div", { class: "section compare", id: "compare" },
    h("h3", {}, "Reference against complaint"),
    h("p", { class: "verdict", id: "verdict" }, c.verdict),
    h("table", { class: "scales" }, h("thead", {}, h("tr", {}, ["Scale", "Reference", "Complaint", "Change"].map((t) => h("th", { scope: "col" }, t)))),
      h("tbody", {}, order.map((s) => h("tr", { class: s.scale === key ? "key" : null },
        h("td", {}, human(s.scale), s.scale === key ? h("span", { class: "badge" }, "key scale") : null),
        ["reference", "complaint", "change"].map((k) => h("td", { class: "num" }, s[k] !== undefined ? `${fmt(s[k])} ${unit(s.unit)}` : "–")))))),
    h("h4", {}, "Differences, largest share first"), h("div", { class: "scroll" }, diffs), pairs,
    h("details", { class: "fold" }, h("summary", {}, "Method"), h("p", {}, c.method)),
    h("h3", { class: "triage-title" }, "The complaint's triage"));
}

async function compare() {
  $("#reference-err").textContent = "";
  let reference;
  try { reference = JSON.parse($("#reference-text").value); } catch (e) {
    $("#reference-err").textContent = `The reference is not JSON: ${e.message}`;
    $("#reference-text").focus();
    return;
  }
  if (!reference || typeof reference !== "object" || Array.isArray(reference)) {
    $("#reference-err").textContent = "The reference is one JSON object (one sample).";
    return;
  }
  saveState();
  const complaint = collect();
  status("Comparing…");
  $("#compare-submit").disabled = true;
  try {
    const res = await fetch("/v1/compare", { method: "POST", body: JSON.stringify({ reference, complaint }), headers: apiHeaders({ "Content-Type": "application/json" }) });
    const data = await res.json().catch(() => ({ title: `HTTP ${res.status}` }));
    if (!res.ok) {
      showProblem(data, true);
      $("#answer").replaceChildren(h("p", { class: "placeholder" }, "No comparison: correct the fields marked (in the form for the complaint, in the reference box for the reference) and press Compare again."));
      $("#print").disabled = true;
      status(`Refused: ${data.title || res.status}`);
      return;
    }
    clearProblems();
    renderReport(data.triage);
    $("#answer").prepend(compareSection(data));
    status(data.differences && data.differences.length ? `Largest share: ${data.differences[0].path}` : "No difference between the two batches.");
    $("#report").focus();
    await drawChart(JSON.stringify(complaint));
  } catch (e) {
    status(`The service did not answer: ${e.message}`);
  } finally {
    $("#compare-submit").disabled = false;
  }
}

// ---- start ----

async function start() {
  $("#api-key").value = sessionStorage.getItem("colloidtriage-key") || "";
  $("#api-key").addEventListener("change", () => { sessionStorage.setItem("colloidtriage-key", $("#api-key").value.trim()); boot(); });
  $("#sample-form").addEventListener("submit", triage);
  $("#sample-form").addEventListener("input", saveState);
  $("#sample-form").addEventListener("change", saveState);
  $("#copy-json").addEventListener("click", () => copy(JSON.stringify(collect(), null, 2), "The request as JSON"));
  $("#copy-curl").addEventListener("click", () => copy(curlText(collect()), "The curl command"));
  $("#print").addEventListener("click", () => window.print());
  $("#reset").addEventListener("click", () => { extras = {}; buildForm(); clearProblems(); saveState(); status("Form cleared."); });
  $("#load-apply").addEventListener("click", () => loadText($("#load-text").value));
  $("#compare-submit").addEventListener("click", compare);
  $("#reference-from-form").addEventListener("click", () => {
    const ref = collect();
    delete ref.symptom;
    delete ref.observation;
    delete ref.observations;
    $("#reference-text").value = JSON.stringify(ref, null, 2);
    status("The form is now the reference too: change the form into the complaint batch and press Compare.");
  });
  $("#reference-file").addEventListener("change", async (e) => { const f = e.target.files[0]; if (f) $("#reference-text").value = await f.text(); });
  $("#load-file").addEventListener("change", async (e) => { const f = e.target.files[0]; if (f) loadText(await f.text()); });
  window.addEventListener("hashchange", () => { const req = stateFromURL(); if (req) { fill(req); triage(); } });
  await boot();
}

async function boot() {
  status("Loading the request contract and the library…");
  try {
    const [o, m] = await Promise.all([fetch("/openapi.json", { headers: apiHeaders() }), fetch("/v1/materials", { headers: apiHeaders() })]);
    if (o.status === 401 || m.status === 401) {
      $("#key-panel").open = true;
      $("#api-key").focus();
      status("The service needs an API key: enter it under Connection.");
      return;
    }
    openapi = await o.json();
    library = await m.json();
  } catch (e) {
    status(`The service did not answer: ${e.message}`);
    return;
  }
  const req = stateFromURL();
  if (req) {
    fill(req);
    saveState();
    await triage();
  } else {
    buildForm();
    status("Ready.");
  }
  document.body.dataset.ready = "true";
}

start();
