// Crustplan page behaviour: small enhancements; every page works without them except the charts.
(function () {
  'use strict';

  function surfaceForm() {
    var form = document.getElementById('surface-form');
    if (!form) { return; }
    var parts = ['waterPct', 'proteinPct', 'fatPct', 'reducingSugarPct', 'sucrosePct', 'starchPct', 'fibrePct', 'ashPct'];
    var out = document.getElementById('remainder');
    function remainder() {
      var sum = 0, ok = true;
      parts.forEach(function (p) {
        var v = parseFloat(form.elements[p].value);
        if (isNaN(v)) { ok = false; } else { sum += v; }
      });
      if (!out) { return; }
      if (!ok) { out.textContent = '–'; return; }
      var r = 100 - sum;
      out.textContent = r < -0.05 ? 'over 100 % by ' + (-r).toFixed(2) + ' %' : Math.max(0, r).toFixed(2) + ' %';
      out.classList.toggle('error', r < -0.05);
    }
    parts.forEach(function (p) { form.elements[p].addEventListener('input', remainder); });
    // offer only the products of the chosen category
    var product = form.elements.product;
    function products() {
      if (!product) { return; }
      var cat = form.elements.category.value;
      Array.prototype.forEach.call(product.options, function (o) {
        var on = !o.dataset.category || o.dataset.category === cat;
        o.hidden = !on;
        o.disabled = !on;
        if (!on && o.selected) { product.value = ''; }
      });
    }
    form.elements.category.addEventListener('change', products);
    products();
    // the one size field reads as the shape says: thickness, width, edge or diameter
    var shape = form.elements.shape;
    var sizeLabel = form.querySelector('label[for="thicknessMm"] span');
    if (shape && sizeLabel) {
      var size = function () {
        var o = shape.options[shape.selectedIndex];
        if (o && o.dataset.size) { sizeLabel.textContent = o.dataset.size; }
      };
      shape.addEventListener('change', size);
      size();
    }
    var defaults = JSON.parse(form.dataset.defaults || '{}');
    var category = form.elements.category;
    function fillFrom(key) {
      var d = defaults[key];
      if (!d) { return; }
      Object.keys(d).forEach(function (k) {
        if (k === 'phPlaceholder') { form.elements.ph.value = ''; form.elements.ph.placeholder = 'typical ' + d[k]; return; }
        if (form.elements[k]) { form.elements[k].value = d[k]; }
      });
      if (shape) { shape.dispatchEvent(new Event('change')); }
      remainder();
    }
    // whether the chef typed values of their own: any filled field that differs from the category's defaults
    function typedOver(key) {
      var d = defaults[key];
      if (!d) { return false; }
      return Object.keys(d).some(function (k) {
        if (k === 'phPlaceholder') { return form.elements.ph.value.trim() !== ''; }
        var el = form.elements[k];
        if (!el || el.value.trim() === '') { return false; }
        if (typeof d[k] !== 'number') { return el.value !== String(d[k]); }
        return parseFloat(String(el.value).replace(',', '.')) !== Number(d[k]);
      });
    }
    var fill = document.getElementById('fill-defaults');
    if (fill) {
      // with script the refill happens on the page; without it the button asks the server
      fill.addEventListener('click', function (e) {
        e.preventDefault();
        fillFrom(category.value);
      });
    }
    // a new category refills the composition: at once when the values were the old category's, after asking when typed
    var previous = category.value;
    category.addEventListener('change', function () {
      var label = category.options[category.selectedIndex].text;
      if (!typedOver(previous) || window.confirm('Switch the composition to the typical values of ' + label
          + '? Your typed values will be replaced. Cancel keeps them.')) {
        fillFrom(category.value);
      }
      previous = category.value;
    });
  }

  function setupForm() {
    var form = document.getElementById('setup-form');
    if (!form) { return; }
    var mode = form.elements.mode;
    function show() {
      form.querySelectorAll('[data-modes]').forEach(function (el) {
        var on = el.dataset.modes.split(' ').indexOf(mode.value) >= 0;
        el.hidden = !on;
      });
    }
    mode.addEventListener('change', show);
    show();
    // the dew point beside the steam share, from the server's table at whole per cent
    var dew = document.getElementById('dew-point');
    var steam = form.elements.steamPct;
    if (dew && steam) {
      var table = dew.dataset.dewPoints.split(',').map(Number);
      steam.addEventListener('input', function () {
        var y = parseFloat(String(steam.value).replace(',', '.'));
        if (!isFinite(y) || y < 0 || y > 100) { dew.textContent = '–'; return; }
        var i = Math.min(99, Math.floor(y));
        var t = table[i] + (table[i + 1] - table[i]) * (y - i);
        dew.textContent = Math.round(t) + ' ' + dew.dataset.unit;
      });
    }
  }

  function planForm() {
    var form = document.getElementById('plan-form');
    if (!form) { return; }
    var surface = form.elements.surfaceId;
    var stage = form.elements.targetStage;
    function filter() {
      var opt = surface.options[surface.selectedIndex];
      var cat = opt ? opt.dataset.category : null;
      var current = stage.value;
      Array.prototype.forEach.call(stage.querySelectorAll('optgroup'), function (g) {
        var on = !cat || g.dataset.category === cat;
        g.hidden = !on;
        g.disabled = !on;
      });
      if (cat && current) {
        var match = stage.querySelector('optgroup[data-category="' + cat + '"] option[value="' + current + '"]');
        if (match) { match.selected = true; } else { stage.value = ''; }
      }
      // no target yet: the category's middle stage, as the server picks it
      var lightness = form.elements.targetLightness;
      var core = form.elements.coreTarget;
      if (cat && stage.value === '' && lightness && lightness.value.trim() === '' && (!core || core.value.trim() === '')) {
        var options = stage.querySelectorAll('optgroup[data-category="' + cat + '"] option');
        if (options.length) { options[Math.floor(options.length / 2)].selected = true; }
      }
    }
    surface.addEventListener('change', filter);
    filter();
    stepRows(form, surface);
  }

  // step rows: add and remove without a round trip; names stay steps[0..n-1] so the server reads them in order
  function stepRows(form, surface) {
    var box = document.getElementById('steps');
    if (!box) { return; }
    var body = box.querySelector('tbody');
    var add = document.getElementById('add-step');
    var single = form.elements.setupId ? form.elements.setupId.closest('.field') : null;
    function renumber() {
      Array.prototype.forEach.call(body.querySelectorAll('tr.step-row'), function (tr, i) {
        tr.querySelector('td.n').textContent = String(i + 1);
        tr.querySelectorAll('[name]').forEach(function (el) {
          el.name = el.name.replace(/^steps\[\d+]/, 'steps[' + i + ']');
          el.id = el.id.replace(/^steps\d+/, 'steps' + i);
        });
      });
      var stepped = Array.prototype.some.call(body.querySelectorAll('select.step-setup'), function (s) { return s.value !== ''; });
      // with steps the one setup above is not used: say so by dimming it
      if (single) { single.classList.toggle('unused', stepped); }
    }
    function stages(tr) {
      var opt = surface.options[surface.selectedIndex];
      var cat = opt ? opt.dataset.category : null;
      tr.querySelectorAll('select.stage-select optgroup').forEach(function (g) {
        var on = !cat || g.dataset.category === cat;
        g.hidden = !on;
        g.disabled = !on;
      });
    }
    add.hidden = false;
    add.addEventListener('click', function () {
      var rows = body.querySelectorAll('tr.step-row');
      var copy = rows[rows.length - 1].cloneNode(true);
      copy.querySelectorAll('input').forEach(function (i) { i.value = ''; });
      copy.querySelectorAll('select').forEach(function (s) { s.value = ''; });
      body.appendChild(copy);
      renumber();
      stages(copy);
      copy.querySelector('select.step-setup').focus();
    });
    body.addEventListener('click', function (e) {
      if (!e.target.classList.contains('remove-step')) { return; }
      var rows = body.querySelectorAll('tr.step-row');
      var tr = e.target.closest('tr');
      if (rows.length > 1) { tr.remove(); } else { tr.querySelectorAll('input, select').forEach(function (x) { x.value = ''; }); }
      renumber();
    });
    body.addEventListener('change', renumber);
    surface.addEventListener('change', function () { body.querySelectorAll('tr.step-row').forEach(stages); });
    body.querySelectorAll('tr.step-row').forEach(stages);
    renumber();
  }

  var INK = '#1f2328';
  var GRID = 'rgba(31,35,40,0.10)';

  function axis(title, extra) {
    var a = { title: { display: true, text: title, color: INK, font: { size: 13 } }, grid: { color: GRID }, ticks: { color: INK } };
    return Object.assign(a, extra || {});
  }

  function points(xs, ys) {
    return xs.map(function (x, i) { return { x: x, y: ys[i] }; });
  }

  function line(label, xs, ys, colour, extra) {
    return Object.assign({ label: label, data: points(xs, ys), borderColor: colour, backgroundColor: colour,
      borderWidth: 2.5, pointRadius: 0, tension: 0.15 }, extra || {});
  }

  // a plan in steps: one shaded band per step behind the lines, numbered as in the steps table
  var BAND = { pan: 'rgba(214,140,72,0.22)', oven: 'rgba(86,128,200,0.18)', fryer: 'rgba(214,180,40,0.24)',
    grill: 'rgba(200,70,70,0.18)', rest: 'rgba(96,150,80,0.18)' };

  function bandsPlugin(bands) {
    return {
      id: 'stepBands',
      beforeDatasetsDraw: function (chart) {
        var area = chart.chartArea, xs = chart.scales.x, ctx = chart.ctx;
        ctx.save();
        bands.forEach(function (b) {
          var from = xs.getPixelForValue(b.fromMin), to = xs.getPixelForValue(b.toMin);
          ctx.fillStyle = BAND[b.mode] || 'rgba(0,0,0,0.06)';
          ctx.fillRect(from, area.top, to - from, area.bottom - area.top);
          ctx.strokeStyle = 'rgba(31,35,40,0.35)';
          ctx.beginPath(); ctx.moveTo(from, area.top); ctx.lineTo(from, area.bottom); ctx.stroke();
          // the name where it fits, else the step's number
          ctx.fillStyle = INK;
          ctx.font = '600 11px ' + Chart.defaults.font.family;
          var text = b.label;
          if (ctx.measureText(text).width > to - from - 6) { text = b.label.split(' ')[0]; }
          if (ctx.measureText(text).width <= to - from - 4) { ctx.fillText(text, from + 3, area.top + 12); }
        });
        ctx.restore();
      }
    };
  }

  function charts() {
    var box = document.getElementById('charts');
    if (!box || !box.dataset.plan || typeof Chart === 'undefined') { return; }
    var d = JSON.parse(box.dataset.plan);
    var t = d.timeMin;
    Chart.defaults.font.family = getComputedStyle(document.body).fontFamily;
    Chart.defaults.color = INK;
    var common = { responsive: true, maintainAspectRatio: false, animation: false, interaction: { mode: 'nearest', axis: 'x', intersect: false },
      plugins: { legend: { position: 'bottom', labels: { boxWidth: 14, color: INK } } } };
    // the axis ends where the cook ends; its end label to a tenth of a minute, not 50.008
    var x = axis('Time (min)', { type: 'linear', min: 0, max: t.length ? t[t.length - 1] : undefined,
      ticks: { color: INK, callback: function (v) { return String(Math.round(v * 10) / 10); } } });
    var targetX = d.targetTimeMin;
    var plugins = d.steps ? [bandsPlugin(d.steps)] : [];
    var marker = function (ys, label) {
      if (targetX === null || targetX === undefined) { return []; }
      return [{ type: 'scatter', label: label, data: [{ x: targetX, y: ys }], pointRadius: 6, pointStyle: 'rectRot',
        borderColor: INK, backgroundColor: '#ffffff', borderWidth: 2 }];
    };

    // the far side only where the plan has one (a slab heated from one face)
    var temperatures = [line('Surface (' + d.unit + ')', t, d.surfaceTemperature, '#b42318')];
    if (d.otherFaceTemperature) {
      temperatures.push(line('Far side, away from the heat (' + d.unit + ')', t, d.otherFaceTemperature, '#b7791f', { borderDash: [6, 4], borderWidth: 2 }));
    }
    temperatures.push(line('Core (' + d.unit + ')', t, d.coreTemperature, '#1d4ed8'));
    if (d.heatSourceTemperature) {
      // the pan or the oil, drawn down by the load and brought back by its heat
      temperatures.push(line(d.heatSourceLabel + ' (' + d.unit + ')', t, d.heatSourceTemperature, '#4b5563',
        { borderDash: [2, 3], borderWidth: 2 }));
    }
    new Chart(document.getElementById('chart-temperature'), {
      type: 'line',
      data: { datasets: temperatures },
      options: Object.assign({}, common, { scales: { x: x, y: axis('Temperature (' + d.unit + ')') } }),
      plugins: plugins
    });

    // one scale: how far the surface has browned, with the category's stage names along it and the target on it
    var target = t.map(function () { return d.targetBrowningPct; });
    var stages = d.stages || [];
    var stageAt = {};
    stages.forEach(function (s) { stageAt[s.pct] = s.label; });
    // the axis ends a little past the darkest stage or the darkest point reached, whichever is higher
    var top = Math.max.apply(null, stages.map(function (s) { return s.pct; }).concat(d.browningPct.filter(function (v) { return v !== null; }), [d.targetBrowningPct || 0]));
    var yMax = Math.min(100, Math.ceil((top + 8) / 10) * 10);
    new Chart(document.getElementById('chart-browning'), {
      type: 'line',
      data: { datasets: [
        line('Browning', t, d.browningPct, '#7a3b12'),
        line('Target' + (d.targetLabel ? ': ' + d.targetLabel : ''), t, target, INK, { borderDash: [8, 5], borderWidth: 2 })
      ].concat(marker(d.targetBrowningPct, 'Target reached')) },
      options: Object.assign({}, common, { scales: { x: x, y: axis('Stage', { min: 0, max: yMax,
        afterBuildTicks: function (scale) {
          scale.ticks = [{ value: 0 }].concat(stages.map(function (s) { return { value: s.pct }; }));
        },
        ticks: { color: INK, autoSkip: false, callback: function (v) { return v === 0 ? 'Raw' : (stageAt[v] || ''); } } }) } }),
      plugins: plugins
    });

    new Chart(document.getElementById('chart-water'), {
      type: 'line',
      data: { datasets: [line('Water activity at the surface', t, d.surfaceWaterActivity, '#0f766e', { fill: false })] },
      options: Object.assign({}, common, { scales: { x: x, y: axis('Water activity a_w (0–1)', { min: 0, max: 1 }) } }),
      plugins: plugins
    });
    box.dataset.bands = String(d.steps ? d.steps.length : 0);
    box.dataset.rendered = 'true';
  }

  // a print button shows only where script can print (the page prints without it too)
  function printButtons() {
    Array.prototype.forEach.call(document.querySelectorAll('[data-print]'), function (b) {
      b.hidden = false;
      b.addEventListener('click', function () { window.print(); });
    });
  }

  // find a setting: offer only the stages of the chosen surface's category, as the plan form does
  function searchForm() {
    var form = document.getElementById('search-form');
    if (!form) { return; }
    var surface = form.elements.surfaceId;
    var stage = form.elements.targetStage;
    function filter() {
      var opt = surface.options[surface.selectedIndex];
      var cat = opt ? opt.dataset.category : null;
      Array.prototype.forEach.call(stage.querySelectorAll('optgroup'), function (g) {
        var on = !cat || g.dataset.category === cat;
        g.hidden = !on;
        g.disabled = !on;
      });
      var chosen = stage.options[stage.selectedIndex];
      if (chosen && chosen.parentNode.disabled) { stage.value = ''; }
    }
    surface.addEventListener('change', filter);
    filter();
  }

  // compare: one line per plan on each chart, coloured and dashed as the table's keys
  function compareCharts() {
    var box = document.getElementById('compare-charts');
    if (!box || !box.dataset.compare || typeof Chart === 'undefined') { return; }
    var d = JSON.parse(box.dataset.compare);
    Chart.defaults.font.family = getComputedStyle(document.body).fontFamily;
    Chart.defaults.color = INK;
    var end = 0;
    d.plans.forEach(function (p) { if (p.timeMin.length) { end = Math.max(end, p.timeMin[p.timeMin.length - 1]); } });
    function chart(id, key, title) {
      var sets = d.plans.map(function (p) {
        var dash = p.dash ? p.dash.split(' ').map(Number) : [];
        return line(p.label, p.timeMin, p[key], p.colour, { borderDash: dash });
      });
      new Chart(document.getElementById(id), {
        type: 'line',
        data: { datasets: sets },
        options: { responsive: true, maintainAspectRatio: false, animation: false,
          interaction: { mode: 'nearest', axis: 'x', intersect: false },
          plugins: { legend: { position: 'bottom', labels: { boxWidth: 14, color: INK } } },
          scales: { x: axis('Time (min)', { type: 'linear', min: 0, max: end ? Math.ceil(end) : undefined }), y: axis(title + ' (' + d.unit + ')') } }
      });
    }
    chart('chart-compare-surface', 'surface', 'Surface');
    chart('chart-compare-core', 'core', 'Core');
    box.dataset.rendered = 'true';
  }

  document.addEventListener('DOMContentLoaded', function () {
    printButtons();
    surfaceForm();
    setupForm();
    planForm();
    charts();
    searchForm();
    compareCharts();
  });
}());
