// CanopyAdvisor pages: one small script, no build step, nothing fetched from anywhere but this service.
// Each page address (/sign-in, /sites, /sites/{id}, /sites/{id}/benches/{benchId}) is drawn by a function below
// from the JSON API; forms show the server's ProblemDetails errors beside the field they name.
"use strict";

const main = document.getElementById("main");
const statusLine = document.getElementById("status");
let me = null;

// ---------- small helpers ----------
function el(tag, attrs = {}, ...children) {
  const node = document.createElement(tag);
  for (const [key, value] of Object.entries(attrs)) {
    if (value === null || value === undefined || value === false) continue;
    if (key === "text") node.textContent = value;
    else if (key.startsWith("on")) node.addEventListener(key.slice(2), value);
    else node.setAttribute(key, value === true ? "" : value);
  }
  for (const child of children.flat()) {
    if (child === null || child === undefined) continue;
    node.append(child instanceof Node ? child : document.createTextNode(String(child)));
  }
  return node;
}
const fmt = (value, digits) => (value === null || value === undefined || Number.isNaN(value)) ? "–" : Number(value).toFixed(digits);
// The nearest of 16 compass points to a bearing in degrees clockwise from north.
const COMPASS = ["N", "NNE", "NE", "ENE", "E", "ESE", "SE", "SSE", "S", "SSW", "SW", "WSW", "W", "WNW", "NW", "NNW"];
const compass = deg => COMPASS[Math.round((((deg % 360) + 360) % 360) / 22.5) % 16];
const say = text => { statusLine.textContent = text; };
function localTime(text) {
  // Offset date-times from the API ("2026-12-02T09:00:00+01"): shown as the site's own local time.
  if (!text) return "–";
  const m = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})/.exec(text);
  return m ? `${m[1]} ${m[2]}` : text;
}

class ApiError extends Error {
  constructor(status, problem) {
    super(problem?.detail || problem?.title || `request failed (${status})`);
    this.status = status;
    this.problem = problem || {};
  }
}

async function api(method, path, body) {
  const init = { method, headers: { Accept: "application/json, application/problem+json" }, credentials: "same-origin" };
  if (body !== undefined) {
    init.headers["Content-Type"] = "application/json";
    init.body = JSON.stringify(body);
  }
  const response = await fetch(path, init);
  const type = response.headers.get("Content-Type") || "";
  const data = type.includes("json") ? await response.json() : await response.text();
  if (response.status === 401 && path !== "/api/session") {
    me = null;
    navigate("/sign-in?next=" + encodeURIComponent(location.pathname), true);
    throw new ApiError(401, { title: "Please sign in" });
  }
  if (!response.ok) throw new ApiError(response.status, typeof data === "object" ? data : { detail: data });
  return data;
}

// ---------- forms: inline errors by field ----------
function field(id, label, input, hint) {
  const hintId = hint ? id + "-hint" : null;
  const errorId = id + "-error";
  input.id = id;
  if (hintId) input.setAttribute("aria-describedby", hintId);
  return el("div", { class: "field" },
    el("label", { for: id, text: label }),
    hint ? el("span", { class: "hint", id: hintId, text: hint }) : null,
    input,
    el("p", { class: "field-error", id: errorId, hidden: true }));
}

function clearErrors(form) {
  form.querySelector(".form-error").replaceChildren();
  for (const p of form.querySelectorAll(".field-error")) { p.hidden = true; p.textContent = ""; }
  for (const input of form.querySelectorAll("[aria-invalid]")) {
    input.removeAttribute("aria-invalid");
    const hint = input.id + "-hint";
    if (document.getElementById(hint)) input.setAttribute("aria-describedby", hint); else input.removeAttribute("aria-describedby");
  }
}

// Shows a ProblemDetails answer: each {path, detail} beside the input whose data-path matches, the rest (and the
// title) in the form's summary; focus goes to the first field in error so keyboard and screen-reader users land there.
function showProblem(form, error) {
  const summary = form.querySelector(".form-error");
  const problems = Array.isArray(error.problem?.errors) ? error.problem.errors : [];
  let first = null;
  const loose = [];
  for (const { path, detail } of problems) {
    const input = form.querySelector(`[data-path="${CSS.escape(path)}"]`);
    if (!input) { loose.push(`${path}: ${detail}`); continue; }
    const message = document.getElementById(input.id + "-error");
    message.textContent = message.textContent ? `${message.textContent}; ${detail}` : detail;
    message.hidden = false;
    input.setAttribute("aria-invalid", "true");
    input.setAttribute("aria-describedby", [input.getAttribute("aria-describedby"), message.id].filter(Boolean).join(" "));
    first ??= input;
  }
  const heading = error.problem?.title || "That did not work";
  const lines = [el("p", {}, el("strong", { text: heading }), problems.length ? ` (${problems.length} problem${problems.length > 1 ? "s" : ""})` : (error.message && error.message !== heading ? `: ${error.message}` : ""))];
  for (const text of loose) lines.push(el("p", { text }));
  summary.replaceChildren(...lines);
  (first || summary).focus();
}

function formShell(attrs, ...fields) {
  return el("form", { novalidate: true, ...attrs },
    el("div", { class: "form-error", role: "alert", tabindex: "-1" }),
    ...fields);
}

// A busy indicator with the elapsed time, for the long computations (forecasts).
function busy(label) {
  const text = el("span");
  const box = el("div", { class: "busy", role: "status" }, el("span", { class: "spinner", "aria-hidden": "true" }), text);
  const started = performance.now();
  const tick = () => { text.textContent = `${label} (${Math.floor((performance.now() - started) / 1000)} s)`; };
  tick();
  const timer = setInterval(tick, 1000);
  return { node: box, stop() { clearInterval(timer); box.remove(); } };
}

// ---------- routing ----------
const routes = [
  [/^\/sign-in$/, signInPage, false],
  [/^\/(sites)?$/, sitesPage, true],
  [/^\/sites\/([^/]+)$/, sitePage, true],
  [/^\/sites\/([^/]+)\/benches\/([^/]+)$/, benchPage, true],
  [/^\/calendar(\/.*)?$/, () => comingPage("Rotation calendar", "The rotation calendar by week, with tasks ticked off as done, arrives with the rotation plan API."), true],
  [/^\/lamps(\/.*)?$/, () => comingPage("Lamp planner", "The lamp planner with before and after lean maps arrives with the lamp proposal API."), true],
  [/^\/outlook(\/.*)?$/, () => comingPage("Weekly outlook", "The weekly outlook for managers arrives with the outlook API."), true],
];

function navigate(path, replace = false) {
  if (replace) history.replaceState(null, "", path); else history.pushState(null, "", path);
  render();
}

async function render() {
  const path = location.pathname.replace(/\/+$/, "") || "/";
  const match = routes.map(([re, page, auth]) => [re.exec(path), page, auth]).find(([m]) => m);
  for (const a of document.querySelectorAll("[data-nav]")) {
    const here = path === "/" + a.dataset.nav || path.startsWith("/" + a.dataset.nav + "/") || (a.dataset.nav === "sites" && path === "/");
    if (here) a.setAttribute("aria-current", "page"); else a.removeAttribute("aria-current");
  }
  say("");
  if (!match) { show("Page not found", el("p", {}, "There is no page here. ", el("a", { href: "/sites", "data-link": true, text: "Go to the sites." }))); return; }
  const [m, page, auth] = match;
  try {
    if (auth && !me) {
      me = await api("GET", "/api/me");
    }
    showWho();
    await page(...m.slice(1).filter(x => x !== undefined).map(decodeURIComponent));
  } catch (error) {
    if (error.status === 401) return;
    show("Something went wrong", el("p", { class: "form-error", text: error.message }));
  }
}

function show(title, ...content) {
  document.title = `${title} · CanopyAdvisor`;
  main.replaceChildren(el("h1", { text: title }), ...content);
  main.focus();
}

function showWho() {
  const who = document.getElementById("who");
  who.hidden = !me;
  if (me) document.getElementById("who-name").textContent = `${me.user.displayName} (${me.user.role}) · ${me.organisationName}`;
}

document.addEventListener("click", event => {
  const a = event.target.closest("a[data-link]");
  if (!a || event.ctrlKey || event.metaKey || event.shiftKey || a.target) return;
  event.preventDefault();
  navigate(a.getAttribute("href"));
});
window.addEventListener("popstate", render);
document.getElementById("sign-out").addEventListener("click", async () => {
  await fetch("/api/session", { method: "DELETE", credentials: "same-origin" });
  me = null;
  showWho();
  navigate("/sign-in");
});

// ---------- pages ----------
function signInPage() {
  const email = el("input", { type: "email", name: "email", autocomplete: "username", "data-path": "email", required: true });
  const password = el("input", { type: "password", name: "password", autocomplete: "current-password", "data-path": "password", required: true });
  const button = el("button", { type: "submit", text: "Sign in" });
  const form = formShell({ class: "panel narrow", "aria-labelledby": "sign-in-title" },
    field("sign-in-email", "E-mail", email),
    field("sign-in-password", "Password", password, "12 to 128 characters."),
    button);
  form.addEventListener("submit", async event => {
    event.preventDefault();
    clearErrors(form);
    button.disabled = true;
    try {
      await api("POST", "/api/session", { email: email.value, password: password.value });
      me = await api("GET", "/api/me");
      const next = new URLSearchParams(location.search).get("next");
      navigate(next && next.startsWith("/") && !next.startsWith("//") ? next : "/sites");
    } catch (error) {
      showProblem(form, error);
    } finally {
      button.disabled = false;
    }
  });
  show("Sign in", el("p", { class: "lede", text: "Sign in with your nursery account." }), form);
  main.querySelector("h1").id = "sign-in-title";
  email.focus();
}

async function sitesPage() {
  const sites = await api("GET", "/api/sites");
  const list = sites.length
    ? el("ul", { class: "cards" }, sites.map(s => el("li", {},
        el("a", { href: `/sites/${encodeURIComponent(s.id)}`, "data-link": true, text: s.name }),
        el("p", { class: "meta", text: `${s.siteKey} · version ${s.version}` }))))
    : el("p", { class: "none", text: "No sites yet. An admin adds them through the API (POST /api/sites)." });
  show("Sites", el("p", { class: "lede", text: `The sites of ${me.organisationName}. Open one for its lean map and benches.` }), list);
}

async function latestForecast(siteId) {
  const list = await api("GET", `/api/sites/${encodeURIComponent(siteId)}/forecasts`);
  if (!list.length) return null;
  list.sort((a, b) => (a.createdAt < b.createdAt ? 1 : -1));
  return api("GET", `/api/sites/${encodeURIComponent(siteId)}/forecasts/${encodeURIComponent(list[0].id)}`);
}

// The forecast's flag causes in words (the API keeps the codes).
const CAUSE_WORDS = {
  lowDli: "low daily light",
  lowPhytochromeState: "low red : far-red",
  highDif: "warm days over cool nights",
  heightOverGrade: "height at sale",
  leanOverGrade: "lean over the grade limit",
};

const UNIT_WORDS = { "mol m-2 d-1": "mol m⁻² d⁻¹", deg: "°", "1": "" };

function flagsCell(flags) {
  if (!flags || !flags.length) return el("span", { class: "none", text: "none" });
  return flags.map(f => {
    const cause = CAUSE_WORDS[f.cause] || f.cause;
    const unit = f.unit in UNIT_WORDS ? UNIT_WORDS[f.unit] : ` ${f.unit}`;
    const sep = unit.startsWith(" ") || unit === "" || unit === "°" ? "" : " ";
    return el("span", { class: "flag", title: `${f.kind}: ${f.cause}`, text: `${f.kind}: ${cause} ${fmt(f.value, 1)}${sep}${unit}, limit ${fmt(f.limit, 1)}${sep}${unit}` });
  });
}

async function sitePage(siteId) {
  const [site, forecast] = await Promise.all([api("GET", `/api/sites/${encodeURIComponent(siteId)}`), latestForecast(siteId)]);
  const summary = site.summary;
  const region = el("section", { "aria-labelledby": "forecast-title" });
  show(summary.name,
    el("p", { class: "lede", text: `${summary.siteKey} · version ${summary.version} · time zone ${site.site.timeZone ?? forecast?.timeZone ?? "–"}` }),
    forecastForm(siteId),
    region);
  drawForecast(siteId, region, forecast);
}

function forecastForm(siteId) {
  const start = el("input", { type: "text", name: "now", "data-path": "now", placeholder: "2026-12-02T09:00:00+01:00", autocomplete: "off" });
  const days = el("input", { type: "number", name: "days", "data-path": "days", value: "7", step: "any", inputmode: "decimal" });
  const band = el("input", { type: "checkbox", name: "includeBand", id: "fc-band", "data-path": "includeBand", checked: true });
  const button = el("button", { type: "submit", text: "Run the forecast" });
  const form = formShell({ class: "panel", "aria-labelledby": "run-title" },
    el("h2", { id: "run-title", text: "Run a forecast" }),
    el("div", { class: "inline-form" },
      field("fc-now", "Start", start, "Leave empty for the start of this hour; or a date and time with its offset."),
      field("fc-days", "Days ahead", days, "More than 0, at most 366."),
      el("div", { class: "field check" }, band, " ", el("label", { for: "fc-band", text: "Include the band over the crop parameters" })),
      el("div", { class: "actions" }, button)));
  form.addEventListener("submit", async event => {
    event.preventDefault();
    clearErrors(form);
    const body = {};
    if (start.value.trim()) body.now = start.value.trim();
    if (days.value.trim() !== "" || days.validity.badInput) {
      const n = Number(days.value);
      body.days = days.value.trim() === "" || Number.isNaN(n) ? days.value : n;
    }
    body.includeBand = band.checked;
    button.disabled = true;
    const indicator = busy("Computing the forecast of every bench");
    form.append(indicator.node);
    say("Computing the forecast…");
    try {
      const forecast = await api("POST", `/api/sites/${encodeURIComponent(siteId)}/forecasts`, body);
      say(`Forecast ready: ${forecast.benches.length} benches.`);
      drawForecast(siteId, document.querySelector("section[aria-labelledby='forecast-title']"), forecast);
    } catch (error) {
      say("");
      showProblem(form, error);
    } finally {
      indicator.stop();
      button.disabled = false;
    }
  });
  return form;
}

async function drawForecast(siteId, region, forecast) {
  const heading = el("h2", { id: "forecast-title", text: "Latest forecast" });
  if (!forecast) {
    region.replaceChildren(heading, el("p", { class: "none", text: "No forecast of this site yet. Run one above." }));
    return;
  }
  const figure = el("figure", { class: "map", "aria-labelledby": "map-caption" },
    el("p", { class: "none", text: "Drawing the map…" }),
    el("figcaption", { id: "map-caption", text: `Lean at the end of the forecast (${localTime(forecast.horizonEnd)}). Each arrow points where a bench's plants lean; its length grows with the lean. The table below gives the same figures.` }));
  const rows = forecast.benches.map(b => el("tr", {},
    el("th", { scope: "row" }, el("a", { href: `/sites/${encodeURIComponent(siteId)}/benches/${encodeURIComponent(b.benchId)}`, "data-link": true, text: b.benchId })),
    el("td", { text: b.cropId }),
    el("td", { class: "num", text: fmt(b.leanDeg, 1) }),
    el("td", { class: "num", text: fmt(b.leanAtHorizonDeg, 1) }),
    el("td", { text: `${compass(b.leanAtHorizonAzimuthDeg)} (${fmt(b.leanAtHorizonAzimuthDeg, 0)}°)` }),
    el("td", { class: "num", text: fmt(b.leanRateDegPerDay, 2) }),
    el("td", { class: "num", text: fmt(b.leanGradeLimitDeg, 0) }),
    el("td", {}, flagsCell(b.flags))));
  const table = el("table", {},
    el("caption", { text: `Benches, from ${localTime(forecast.now)} to ${localTime(forecast.horizonEnd)} (${forecast.timeZone})` }),
    el("thead", {}, el("tr", {},
      ["Bench", "Crop", "Lean now (°)", "Lean at horizon (°)", "Direction at horizon", "Rate (°/day)", "Grade limit (°)", "Flags"]
        .map((t, i) => el("th", { scope: "col", class: i >= 2 && i <= 6 && i !== 4 ? "num" : null, text: t })))),
    el("tbody", {}, rows));
  region.replaceChildren(heading,
    el("p", { class: "meta", text: `Computed ${localTime(forecast.createdAt)} UTC · daylight: ${forecast.daylight} · step ${forecast.stepMinutes} min` }),
    figure, el("h2", { text: "Benches" }), table);
  try {
    const svg = await api("GET", `/api/sites/${encodeURIComponent(siteId)}/maps/lean`);
    // The picture is drawn by this service (escaped text only); parsed as SVG, not HTML, before it is shown.
    const doc = new DOMParser().parseFromString(svg, "image/svg+xml");
    const picture = document.importNode(doc.documentElement, true);
    picture.setAttribute("role", "img");
    picture.setAttribute("aria-labelledby", "map-caption");
    figure.firstChild.replaceWith(picture);
  } catch (error) {
    figure.firstChild.textContent = `The map could not be drawn: ${error.message}`;
  }
}

async function benchPage(siteId, benchId) {
  const [site, forecast] = await Promise.all([api("GET", `/api/sites/${encodeURIComponent(siteId)}`), latestForecast(siteId)]);
  const back = el("p", {}, el("a", { href: `/sites/${encodeURIComponent(siteId)}`, "data-link": true, text: "← Back to the site" }));
  const lotIndex = (site.site.lots || []).findIndex(l => l.benchId === benchId);
  const lotSection = lotIndex >= 0
    ? [el("h2", { id: "lot-title", text: "Crop lot on this bench" }), lotForm(siteId, lotIndex, site.site.lots[lotIndex])]
    : [el("h2", { text: "Crop lot on this bench" }), el("p", { class: "none", text: "No crop lot on this bench." })];
  const bench = forecast?.benches.find(b => b.benchId === benchId);
  if (!bench) {
    show(`Bench ${benchId}`, back, el("p", { class: "none", text: "This bench has no forecast yet: run one from the site page (a bench needs a crop lot)." }), ...lotSection);
    return;
  }
  const fact = (label, value) => el("div", {}, el("dt", { text: label }), el("dd", { text: value }));
  const arrow = el("span", { class: "compass", "aria-hidden": "true", text: "↑" });
  arrow.style.transform = `rotate(${bench.leanAzimuthDeg}deg)`;
  show(`Bench ${bench.benchId}`,
    back,
    el("p", { class: "lede", text: `Lot ${bench.lotId} of ${bench.cropId}. Forecast from ${localTime(forecast.now)} to ${localTime(forecast.horizonEnd)} (${forecast.timeZone}).` }),
    el("dl", { class: "facts" },
      fact("Lean now", `${fmt(bench.leanDeg, 1)}° toward ${bench.leanDirection}`),
      fact("Lean at the horizon", `${fmt(bench.leanAtHorizonDeg, 1)}° toward ${compass(bench.leanAtHorizonAzimuthDeg)}`),
      fact("Direction now → horizon", `${fmt(bench.leanAzimuthDeg, 0)}° → ${fmt(bench.leanAtHorizonAzimuthDeg, 0)}° from north`),
      fact("Lean rate", `${fmt(bench.leanRateDegPerDay, 2)}° per day`),
      fact("Worst plant now", `${fmt(bench.worstLeanDeg, 1)}°`),
      fact("Grade limit", `${fmt(bench.leanGradeLimitDeg, 0)}°`),
      fact("Leaves grade", bench.leavesGradeAt ? localTime(bench.leavesGradeAt) : "not within the forecast"),
      fact("Band at the horizon", bench.leanAtHorizonBand ? `${fmt(bench.leanAtHorizonBand.lowDeg, 1)}–${fmt(bench.leanAtHorizonBand.highDeg, 1)}°` : "not computed"),
      fact("Height now → horizon", `${fmt(bench.heightMm, 0)} → ${fmt(bench.heightAtHorizonMm, 0)} mm`),
      fact("Height at sale (limit)", `${fmt(bench.heightAtSaleMm, 0)} mm (${fmt(bench.heightGradeLimitMm, 0)} mm)`),
      fact("Mean DLI", `${fmt(bench.dliMolPerM2Day, 1)} mol m⁻² d⁻¹`),
      fact("DIF", `${fmt(bench.difK, 1)} K`)),
    el("p", {}, arrow, " the arrow shows where the tops point now (north is up)."),
    el("h2", { text: "Flags" }),
    el("p", {}, flagsCell(bench.flags)),
    el("h2", { id: "track-title", text: "Lean track" }),
    leanChart(bench),
    ...lotSection);
}

// Edits the measured and planned figures of a bench's lot: the site file is read, the lot changed and the whole file
// sent back with If-Match (the service refuses a replace over someone else's change, and checks who may change lots).
function lotForm(siteId, index, lot) {
  const path = name => `lots[${index}].${name}`;
  const inputs = {
    heightMm: el("input", { type: "number", step: "any", inputmode: "decimal", name: "heightMm", "data-path": path("heightMm"), value: lot.heightMm ?? "" }),
    measuredOn: el("input", { type: "date", name: "measuredOn", "data-path": path("measuredOn"), value: lot.measuredOn ?? "" }),
    saleOn: el("input", { type: "date", name: "saleOn", "data-path": path("saleOn"), value: lot.saleOn ?? "" }),
    spacingM: el("input", { type: "number", step: "any", inputmode: "decimal", name: "spacingM", "data-path": path("spacingM"), value: lot.spacingM ?? "" }),
    pots: el("input", { type: "number", step: "1", inputmode: "numeric", name: "pots", "data-path": path("pots"), value: lot.pots ?? "" }),
  };
  const button = el("button", { type: "submit", text: "Save the lot" });
  const saved = el("p", { class: "meta", role: "status" });
  const form = formShell({ class: "panel", "aria-labelledby": "lot-title" },
    el("p", { class: "meta", text: `Lot ${lot.id} of ${lot.crop}, planted ${lot.plantedOn}.` }),
    el("div", { class: "inline-form" },
      field("lot-height", "Measured height (mm)", inputs.heightMm, "Mean height of sample plants."),
      field("lot-measured", "Measured on", inputs.measuredOn),
      field("lot-sale", "Sale date", inputs.saleOn),
      field("lot-spacing", "Spacing (m)", inputs.spacingM),
      field("lot-pots", "Pots", inputs.pots),
      el("div", { class: "actions" }, button)),
    saved);
  const value = (input, numeric) => {
    const text = input.value.trim();
    if (text === "") return undefined;
    if (!numeric) return text;
    const n = Number(text);
    return Number.isNaN(n) ? text : n;
  };
  form.addEventListener("submit", async event => {
    event.preventDefault();
    clearErrors(form);
    saved.textContent = "";
    button.disabled = true;
    try {
      const response = await fetch(`/api/sites/${encodeURIComponent(siteId)}`, { credentials: "same-origin", headers: { Accept: "application/json" } });
      if (!response.ok) throw new ApiError(response.status, await response.json());
      const current = await response.json();
      const file = current.site;
      const target = file.lots?.[index];
      if (!target || target.id !== lot.id) throw new ApiError(409, { title: "The site has changed", detail: "this lot moved or was removed; reload the page" });
      for (const [name, input] of Object.entries(inputs)) {
        const v = value(input, input.type === "number");
        if (v === undefined) delete target[name]; else target[name] = v;
      }
      const put = await fetch(`/api/sites/${encodeURIComponent(siteId)}`, {
        method: "PUT",
        credentials: "same-origin",
        headers: { "Content-Type": "application/json", Accept: "application/json", "If-Match": `"${current.summary.version}"` },
        body: JSON.stringify(file),
      });
      const answer = await put.json();
      if (!put.ok) throw new ApiError(put.status, answer);
      saved.textContent = `Saved: site version ${answer.version}. Run the forecast again on the site page to see the change.`;
    } catch (error) {
      showProblem(form, error);
    } finally {
      button.disabled = false;
    }
  });
  return form;
}

// The lean track as a line chart: time across, lean up, the grade limit as a dashed line labelled in words.
function leanChart(bench) {
  const track = bench.leanTrack || [];
  if (track.length < 2) return el("p", { class: "none", text: "This forecast was stored without its lean track; run it again to see the chart." });
  const NS = "http://www.w3.org/2000/svg";
  const s = (tag, attrs, text) => { const n = document.createElementNS(NS, tag); for (const [k, v] of Object.entries(attrs)) n.setAttribute(k, v); if (text !== undefined) n.textContent = text; return n; };
  const W = 720, H = 280, L = 56, R = 16, T = 16, B = 44;
  const times = track.map(p => Date.parse(/[+-]\d\d$/.test(p.at) ? p.at + ":00" : p.at));
  const t0 = times[0], t1 = times[times.length - 1];
  const top = Math.max(bench.leanGradeLimitDeg * 1.1, ...track.map(p => p.leanDeg), 1);
  const x = t => L + (W - L - R) * (t - t0) / Math.max(1, t1 - t0);
  const y = v => T + (H - T - B) * (1 - v / top);
  const svg = s("svg", { viewBox: `0 0 ${W} ${H}`, role: "img", "aria-labelledby": "track-title track-desc" });
  svg.append(s("desc", { id: "track-desc" }, `Bench lean from ${fmt(track[0].leanDeg, 1)}° to ${fmt(track[track.length - 1].leanDeg, 1)}° over ${Math.round((t1 - t0) / 36e5)} hours; grade limit ${fmt(bench.leanGradeLimitDeg, 0)}°.`));
  const ticks = 5;
  for (let i = 0; i <= ticks; i++) {
    const v = top * i / ticks;
    svg.append(s("line", { class: "grid", x1: L, x2: W - R, y1: y(v), y2: y(v) }));
    svg.append(s("text", { x: L - 6, y: y(v) + 4, "text-anchor": "end" }, fmt(v, 1)));
  }
  const dayMs = 864e5;
  for (let t = Math.ceil(t0 / dayMs) * dayMs; t <= t1; t += dayMs) {
    svg.append(s("line", { class: "grid", x1: x(t), x2: x(t), y1: T, y2: H - B }));
    svg.append(s("text", { x: x(t), y: H - B + 16, "text-anchor": "middle" }, new Date(t).toISOString().slice(5, 10)));
  }
  svg.append(s("line", { class: "axis", x1: L, x2: L, y1: T, y2: H - B }));
  svg.append(s("line", { class: "axis", x1: L, x2: W - R, y1: H - B, y2: H - B }));
  svg.append(s("line", { class: "limit", x1: L, x2: W - R, y1: y(bench.leanGradeLimitDeg), y2: y(bench.leanGradeLimitDeg) }));
  svg.append(s("text", { x: W - R - 4, y: y(bench.leanGradeLimitDeg) - 6, "text-anchor": "end" }, `grade limit ${fmt(bench.leanGradeLimitDeg, 0)}°`));
  svg.append(s("polyline", { class: "track", points: track.map((p, i) => `${x(times[i]).toFixed(1)},${y(p.leanDeg).toFixed(1)}`).join(" ") }));
  svg.append(s("text", { x: 14, y: T + (H - T - B) / 2, transform: `rotate(-90 14 ${T + (H - T - B) / 2})`, "text-anchor": "middle" }, "lean (°)"));
  svg.append(s("text", { x: L + (W - L - R) / 2, y: H - 6, "text-anchor": "middle" }, "date (UTC days)"));
  return el("figure", { class: "chart" }, svg, el("figcaption", { class: "meta", text: "Bench-mean lean every hour of the forecast; the dashed line is the crop's grade limit." }));
}

function comingPage(title, text) {
  show(title, el("div", { class: "coming" },
    el("p", { text: `Not available yet. ${text}` }),
    el("p", {}, el("a", { href: "/sites", "data-link": true, text: "Back to the sites" }))));
}

render();
