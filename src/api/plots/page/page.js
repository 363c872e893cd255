"use strict";
// The operations page: clock tiles fed by /v1/time/now, the tables' state, the upload of an
// ephemeris for its proper-time plot and summary. Talks to this origin only.
(function () {
  const NEAR_DAYS = 45; // a table is "near expiry" below this many days
  const $ = (id) => document.getElementById(id);
  const tiles = new Map();

  function tile(scale) {
    let out = tiles.get(scale);
    if (!out) {
      const row = document.createElement("div");
      row.className = "scale";
      row.setAttribute("role", "listitem");
      const name = document.createElement("span");
      name.className = "name";
      name.textContent = scale;
      out = document.createElement("output");
      out.dataset.scale = scale;
      row.append(name, out);
      $("scales").append(row);
      tiles.set(scale, out);
    }
    return out;
  }

  let readings = 0;
  async function tick() {
    try {
      const answer = await fetch("/v1/time/now?forms=iso", { cache: "no-store" }).then((r) => {
        if (!r.ok) throw new Error("HTTP " + r.status);
        return r.json();
      });
      tile(answer.input.scale).textContent = answer.input.iso;
      for (const result of answer.results) tile(result.scale).textContent = result.iso;
      readings += 1;
      const status = $("now-status");
      status.dataset.count = String(readings);
      status.textContent = "Last reading " + new Date().toLocaleTimeString() + (answer.warnings && answer.warnings.length ? " — " + answer.warnings.join("; ") : "");
    } catch (e) {
      $("now-status").textContent = "No reading: " + e.message;
    }
  }

  function flag(card, flagEl, days, what) {
    let state = "current";
    let text = what + " current: " + Math.floor(days) + " days left";
    if (days <= 0) {
      state = "expired";
      text = what + " EXPIRED " + Math.ceil(-days) + " days ago — answers past it are extrapolated";
    } else if (days < NEAR_DAYS) {
      state = "near";
      text = what + " expires in " + Math.floor(days) + " days — update it";
    }
    $(card).dataset.state = state;
    $(flagEl).textContent = text;
  }

  async function tables() {
    try {
      const leap = await fetch("/v1/time/leap-seconds").then((r) => r.json());
      $("leap-source").textContent = leap.source;
      $("leap-expires").textContent = leap.expires;
      $("leap-days").textContent = leap.expires_in_days.toFixed(1);
      const last = leap.entries[leap.entries.length - 1];
      $("leap-now").textContent = last ? last.tai_minus_utc_s + " s since " + last.utc_date : "–";
      flag("leap-card", "leap-flag", leap.expires_in_days, "Leap-second table");
    } catch (e) {
      $("leap-flag").textContent = "cannot read the table: " + e.message;
    }
    try {
      const eop = await fetch("/v1/earth/eop").then((r) => r.json());
      $("eop-source").textContent = eop.source;
      $("eop-observed").textContent = eop.last_observed || "–";
      const end = eop.end_of_predictions || eop.last_day;
      $("eop-end").textContent = end || "–";
      if (end) {
        const days = (Date.parse(end + "T00:00:00Z") - Date.now()) / 86400000;
        $("eop-days").textContent = days.toFixed(1);
        flag("eop-card", "eop-flag", days, "EOP table");
      }
    } catch (e) {
      $("eop-flag").textContent = "cannot read the table: " + e.message;
    }
  }

  function mediaType(name, text) {
    const lower = (name || "").toLowerCase();
    if (lower.endsWith(".oem")) return "application/ccsds-oem";
    if (lower.endsWith(".sp3")) return "application/sp3";
    if (lower.endsWith(".json") || text.trimStart().startsWith("{")) return "application/json";
    return "text/plain";
  }

  function fixed(value, digits) {
    return Number.isFinite(value) ? value.toFixed(digits) : "–";
  }

  let plotUrl = null;
  async function compute(name, text) {
    const status = $("upload-status");
    status.className = "status";
    status.textContent = "Computing " + (name || "pasted text") + "…";
    const type = mediaType(name, text);
    try {
      const summary = await fetch("/v1/clock/proper-time?include_series=false", {
        method: "POST", headers: { "content-type": type, accept: "application/json" }, body: text,
      });
      const answer = await summary.json();
      if (!summary.ok) {
        const where = ["field", "line", "object", "index"].filter((k) => answer[k] !== undefined).map((k) => k + " " + answer[k]).join(", ");
        throw new Error((answer.code || summary.status) + ": " + (answer.detail || "") + (where ? " (" + where + ")" : ""));
      }
      const body = $("upload-summary").querySelector("tbody");
      body.textContent = "";
      for (const object of answer.objects) {
        const row = document.createElement("tr");
        const s = object.summary;
        for (const cell of [object.id, object.frame + " / " + object.time_scale, String(object.state_count),
          fixed(s.span_s / 3600, 2), fixed(s.accumulated_s * 1e6, 4), fixed(s.mean_rate_us_per_day, 4),
          fixed(s.periodic_amplitude_s * 1e9, 3)]) {
          const td = document.createElement("td");
          td.textContent = cell;
          row.append(td);
        }
        body.append(row);
      }
      const plot = await fetch("/v1/clock/proper-time", {
        method: "POST", headers: { "content-type": type, accept: "image/svg+xml" }, body: text,
      });
      if (!plot.ok) throw new Error("plot: HTTP " + plot.status);
      const blob = await plot.blob();
      if (plotUrl) URL.revokeObjectURL(plotUrl);
      plotUrl = URL.createObjectURL(blob);
      $("upload-plot").src = plotUrl;
      $("upload-result").hidden = false;
      status.textContent = (name || "Pasted text") + ": " + answer.objects.length + " object(s), reference " + answer.reference + ".";
    } catch (e) {
      status.className = "status error";
      status.textContent = "Not computed — " + e.message;
    }
  }

  function readFile(file) {
    if (!file) return;
    file.text().then((text) => compute(file.name, text));
  }

  const zone = $("drop-zone");
  zone.addEventListener("dragover", (e) => { e.preventDefault(); zone.classList.add("over"); });
  zone.addEventListener("dragleave", () => zone.classList.remove("over"));
  zone.addEventListener("drop", (e) => {
    e.preventDefault();
    zone.classList.remove("over");
    readFile(e.dataTransfer.files[0]);
  });
  $("file-input").addEventListener("change", (e) => readFile(e.target.files[0]));
  $("paste-go").addEventListener("click", () => compute("", $("paste").value));

  tick();
  setInterval(tick, 1000);
  tables();
  setInterval(tables, 600000);
})();
