// Draws the report's layers with Leaflet. All text comes from the JSON data block and is shown with
// textContent, never parsed as HTML.
(function () {
  'use strict';
  var started = performance.now();
  var data = JSON.parse(document.getElementById('report-data').textContent);
  var map = L.map('map', { zoomSnap: 0.25, maxZoom: 20 });
  map.attributionControl.setPrefix('Leaflet');
  L.control.scale({ imperial: false }).addTo(map);
  if (data.basemap) {
    L.tileLayer(data.basemap.url, { maxZoom: 20, maxNativeZoom: 19, attribution: escapeHtml(data.basemap.credit) }).addTo(map);
  }

  function escapeHtml(text) {
    var div = document.createElement('div');
    div.textContent = text;
    return div.innerHTML;
  }

  // Positions are millionths of a degree, each the difference from the one before it in the feature.
  function decode(parts) {
    var x = 0;
    var y = 0;
    return parts.map(function (part) {
      var points = [];
      for (var i = 0; i < part.length; i += 2) {
        x += part[i];
        y += part[i + 1];
        points.push([y / 1e6, x / 1e6]);
      }
      return points;
    });
  }

  function detailsNode(feature) {
    var table = document.createElement('table');
    table.className = 'feature-details';
    if (feature.t) {
      table.createCaption().textContent = feature.t;
    }
    (feature.d || []).forEach(function (row) {
      var tr = table.insertRow();
      var th = document.createElement('th');
      th.textContent = row[0];
      tr.appendChild(th);
      tr.insertCell().textContent = row[1];
    });
    return table;
  }

  function labelIcon(text) {
    var span = document.createElement('span');
    span.textContent = text;
    return L.divIcon({ className: 'map-label', html: span, iconSize: null });
  }

  var tip = L.tooltip({ direction: 'top', offset: [0, -6] });
  var shown = {};
  var groupShown = {};
  var buckets = [];
  var drawn = 0;

  data.groups.forEach(function (g) { groupShown[g.id] = true; });

  data.layers.forEach(function (layer, index) {
    var pane = map.createPane('layer-' + layer.id);
    pane.style.zIndex = String(400 + index);
    var renderer = L.canvas({ pane: 'layer-' + layer.id, tolerance: 4 });
    var style = layer.style;
    var byGroup = {};
    shown[layer.id] = layer.shown;
    layer.features.forEach(function (feature) {
      var key = feature.g || '';
      var group = byGroup[key];
      if (!group) {
        group = byGroup[key] = L.featureGroup();
        buckets.push({ layer: layer.id, group: key, content: group, arrows: layer.kind === 'arrows' });
      }
      var colour = feature.c || style.colour;
      var interactive = Boolean(feature.t || feature.d);
      var shape;
      if (layer.kind === 'lines') {
        shape = L.polyline(decode(feature.p), {
          renderer: renderer, color: colour, weight: style.width, opacity: style.opacity,
          dashArray: style.dash || null, lineCap: style.dash ? 'butt' : 'round', interactive: interactive
        });
      } else if (layer.kind === 'arrows') {
        shape = L.polygon(decode(feature.p), {
          renderer: renderer, color: colour, weight: 1, opacity: style.opacity, fillColor: colour,
          fillOpacity: style.opacity, interactive: false
        });
      } else if (layer.kind === 'points') {
        shape = L.circleMarker(decode(feature.p)[0][0], {
          renderer: renderer, radius: style.width / 2, color: '#ffffff', weight: 2,
          fillColor: colour, fillOpacity: style.opacity, interactive: interactive
        });
      } else {
        shape = L.marker(decode(feature.p)[0][0], { icon: labelIcon(feature.t || ''), pane: 'layer-' + layer.id, keyboard: false });
      }
      shape.reportFeature = feature;
      group.addLayer(shape);
      drawn++;
    });
    Object.keys(byGroup).forEach(function (key) {
      var group = byGroup[key];
      group.on('mouseover', function (e) {
        var f = e.propagatedFrom.reportFeature;
        if (f.t && layer.kind !== 'labels') {
          var node = document.createElement('span');
          node.textContent = f.t;
          tip.setLatLng(e.latlng).setContent(node);
          map.openTooltip(tip);
        }
      });
      group.on('mouseout', function () { map.closeTooltip(tip); });
      group.on('click', function (e) {
        var f = e.propagatedFrom.reportFeature;
        if (f.t || f.d) {
          L.popup({ maxWidth: 360 }).setLatLng(e.latlng).setContent(detailsNode(f)).openOn(map);
        }
      });
    });
  });

  // Arrowheads are drawn only where they are big enough to read as arrows: a pixel covers at most
  // ARROW_METRES_PER_PIXEL metres (Web Mercator ground resolution: 156543.03 m at zoom 0 on the equator,
  // times the cosine of the latitude, halved at each zoom level).
  var ARROW_METRES_PER_PIXEL = 2;
  function arrowsReadable() {
    var metresPerPixel = 156543.03392 * Math.cos(map.getCenter().lat * Math.PI / 180) / Math.pow(2, map.getZoom());
    return metresPerPixel <= ARROW_METRES_PER_PIXEL;
  }

  function refresh() {
    var readable = arrowsReadable();
    buckets.forEach(function (b) {
      var visible = shown[b.layer] && (b.group === '' || groupShown[b.group] !== false) && (!b.arrows || readable);
      if (visible && !map.hasLayer(b.content)) {
        b.content.addTo(map);
      } else if (!visible && map.hasLayer(b.content)) {
        map.removeLayer(b.content);
      }
    });
  }

  document.querySelectorAll('input[data-layer]').forEach(function (box) {
    box.addEventListener('change', function () { shown[box.dataset.layer] = box.checked; refresh(); });
  });
  document.querySelectorAll('input[data-group]').forEach(function (box) {
    box.addEventListener('change', function () { groupShown[box.dataset.group] = box.checked; refresh(); });
  });

  if (data.bounds) {
    map.fitBounds([[data.bounds[0], data.bounds[1]], [data.bounds[2], data.bounds[3]]], { padding: [16, 16] });
  } else {
    map.setView([0, 0], 2);
  }
  refresh();
  map.on('zoomend', refresh);
  // For scripting and tests: the map, and how many features were drawn and how long it took.
  window.streetcombReport = { map: map, drawn: drawn, buckets: buckets };
  document.body.dataset.drawn = String(drawn);
  document.body.dataset.drawMs = String(Math.round(performance.now() - started));
  document.body.dataset.ready = 'true';
}());
