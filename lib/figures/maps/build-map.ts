// Assembles a map as one SVG: raster field under vector land, graticule, outlines, points, legends and title.
import { geoPath, type GeoPermissibleObjects } from 'd3-geo';
import type { MultiLineString, MultiPolygon, Polygon } from 'geojson';
import { densify } from './densify.js';
import { rewind } from './rewind.js';
import { makeProjection, type MapProjectionKind } from './projection.js';
import { colourScale, valueExtent, type ColourScale } from './colour-scale.js';
import { rasterImage } from './raster.js';
import { graticuleLines, landFeature } from './land.js';
import { colourBar, swatchRow, type LegendText, type SwatchItem } from './legend.js';
import { escapeXml, textWidth } from './svg-text.js';
import { formatNumber } from '../svg-precision.js';
import { categoricalColour, DIVERGING_SCHEME, NEUTRALS, SEQUENTIAL_SCHEME } from '../palettes.js';
import type { LatticeField } from '../raster-sample.js';

/** A gridded field drawn as a raster. */
export interface RasterLayer {
  /** The 2-D field (see gridLevel, feStarGrid). */
  field: LatticeField;
  /** Colour-bar title with units, e.g. 'dFe at 10 m (nmol kg⁻¹)'. */
  title: string;
  /** Log10 colours (dFe spans decades). */
  log?: boolean;
  /** Colour domain; default the field's finite (positive, for log) range. */
  domain?: [number, number];
  /** vega scheme; default viridis, or the diverging scheme when centreZero. */
  scheme?: string;
  /** Diverging colours centred on zero (Fe*, anomalies). */
  centreZero?: boolean;
  /** Nearest node (default) or bilinear. */
  sampling?: 'nearest' | 'bilinear';
}

/** A sampling station, coloured by cruise. */
export interface StationPoint {
  /** Degrees east. */
  lon: number;
  /** Degrees north. */
  lat: number;
  /** Cruise identifier; colours follow the sorted cruise list. */
  cruise: string;
}

/** A cell sampling site, coloured by its median Fe:C on a log scale. */
export interface CellSitePoint {
  /** Degrees east. */
  lon: number;
  /** Degrees north. */
  lat: number;
  /** Median Fe:C at the site, µmol mol⁻¹. */
  value: number;
}

/** A region polygon: outlined, optionally filled by its residual and flagged with a label. */
export interface RegionShape {
  /** Region identifier. */
  id: string;
  /** Geometry in lon/lat (d3-geo winding: exterior rings clockwise). */
  geometry: Polygon | MultiPolygon;
  /** Mean log10 residual (or any zero-centred anomaly) for the choropleth; undefined = no fill. */
  residual?: number;
  /** Flagged regions get a heavy outline and their label. */
  flagged?: boolean;
  /** Label drawn at the region's centroid when flagged, e.g. 'Drake ↓ 0.6×'. */
  label?: string;
}

/** A named outline such as the HNLC contour (see thresholdOutline). */
export interface OutlineLayer {
  /** Geometry in lon/lat (for a threshold outline, its `lines`). */
  geometry: Polygon | MultiPolygon | MultiLineString;
  /** Legend text, e.g. 'HNLC: nitrate ≥ 4 µmol kg⁻¹'. */
  label: string;
}

/** Everything a map can show; every layer is optional. */
export interface MapLayers {
  /** Gridded field under everything else. */
  raster?: RasterLayer;
  /** Region outlines and residual choropleth. */
  regions?: { shapes: RegionShape[]; title?: string };
  /** Dashed outlines (HNLC). */
  outlines?: OutlineLayer[];
  /** Stations by cruise. */
  stations?: StationPoint[];
  /** Cell sampling sites by median Fe:C. */
  cells?: { points: CellSitePoint[]; title?: string };
  /** Draw land (default true). */
  land?: boolean;
  /** Graticule step in degrees, or false for none (default 30). */
  graticule?: number | false;
}

/** Map options: projection, size, text. */
export interface MapOptions {
  /** Projection (Equal Earth for global, azimuthal equal-area for the poles). */
  projection: MapProjectionKind;
  /** Total SVG width in px. */
  widthPx: number;
  /** Total SVG height in px; default from the projection's aspect plus title and legend bands. */
  heightPx?: number;
  /** Polar maps: clip latitude in degrees (default 40). */
  boundaryLat?: number;
  /** Central meridian, degrees east (default 0). */
  centralLon?: number;
  /** Title drawn at the top. */
  title?: string;
  /** Caption drawn under the legends (wrapped). */
  caption?: string;
  /** Font family of all text (default 'DejaVu Sans'). */
  fontFamily?: string;
  /** Text width measure (the renderer's), for legend layout and caption wrapping. */
  measure?: (text: string, fontSize: number) => number;
  /** Prefix for SVG ids (clip path, gradients), unique per page. */
  idPrefix?: string;
  /** Raster image pixels per SVG px (default 2). */
  pixelRatio?: number;
}

/** A built map. */
export interface MapResult {
  /** SVG text. */
  svg: string;
  /** SVG size in px. */
  width: number;
  height: number;
}

const f = (v: number) => formatNumber(v, 2);

function wrap(text: string, width: number, size: number, measure: MapOptions['measure']): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (line && textWidth(next, size, measure) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** The map as SVG: pure function of layers and options (same inputs, same bytes). */
export function buildMap(layers: MapLayers, options: MapOptions): MapResult {
  const W = options.widthPx;
  const font = options.fontFamily ?? 'DejaVu Sans';
  const id = options.idPrefix ?? 'map';
  const text: LegendText = { fontFamily: font, fontSize: 9, measure: options.measure };
  const pad = 6;
  const titleH = options.title ? 20 : pad;

  // Colour scales first: legends need their count to size the bottom band.
  const bars: { scale: ColourScale; title: string }[] = [];
  let rasterScale: ColourScale | undefined;
  if (layers.raster) {
    const r = layers.raster;
    const dom = r.domain ?? valueExtent(r.field.values, r.log) ?? [r.log ? 1 : 0, r.log ? 10 : 1];
    rasterScale = colourScale({ domain: dom, log: r.log, scheme: r.scheme ?? (r.centreZero ? DIVERGING_SCHEME : SEQUENTIAL_SCHEME), centreZero: r.centreZero });
    bars.push({ scale: rasterScale, title: r.title });
  }
  let residualScale: ColourScale | undefined;
  const residuals = (layers.regions?.shapes ?? []).map((s) => s.residual ?? Number.NaN);
  const residualExtent = valueExtent(residuals);
  if (residualExtent) {
    residualScale = colourScale({ domain: residualExtent, scheme: DIVERGING_SCHEME, centreZero: true });
    bars.push({ scale: residualScale, title: layers.regions?.title ?? 'residual (log10)' });
  }
  let cellScale: ColourScale | undefined;
  if (layers.cells && layers.cells.points.length) {
    const dom = valueExtent(layers.cells.points.map((p) => p.value), true) ?? [1, 10];
    cellScale = colourScale({ domain: dom, log: true, scheme: 'plasma' });
    bars.push({ scale: cellScale, title: layers.cells.title ?? 'median Fe:C (µmol mol⁻¹)' });
  }
  const cruises = [...new Set((layers.stations ?? []).map((s) => s.cruise))].sort();
  const swatches: SwatchItem[] = [
    ...cruises.map((c, i) => ({ label: c, colour: categoricalColour(i), shape: 'circle' as const })),
    ...(layers.outlines ?? []).map((o) => ({ label: o.label, colour: '#000000', shape: 'dashed-line' as const })),
  ];

  // Legend band: colour bars side by side, swatches below, caption below that.
  const innerW = W - 2 * pad;
  const barW = bars.length ? Math.min(170, (innerW - (bars.length - 1) * 16) / bars.length) : 0;
  const barBlockH = bars.length ? 2 * text.fontSize + 18 : 0;
  const swatchProbe = swatchRow(swatches, { x: pad, y: 0, width: innerW }, text);
  const captionLines = options.caption ? wrap(options.caption, innerW, text.fontSize, options.measure) : [];
  const captionH = captionLines.length * (text.fontSize + 3);
  const legendH = barBlockH + (swatchProbe.height ? swatchProbe.height + 4 : 0) + (captionH ? captionH + 4 : 0) + pad;

  const aspect = options.projection === 'equal-earth' ? 0.487 : 1;
  const mapH = options.heightPx ? options.heightPx - titleH - legendH : Math.round(innerW * aspect);
  const H = options.heightPx ?? titleH + mapH + legendH;
  const extent: [[number, number], [number, number]] = [[pad, titleH], [W - pad, titleH + mapH]];
  const map = makeProjection(options.projection, { extent, boundaryLat: options.boundaryLat, centralLon: options.centralLon });
  const path = geoPath(map.projection).digits(2);
  // Straight lon/lat edges (boxes along parallels) are densified, so they follow parallels, not great circles.
  const d = (o: GeoPermissibleObjects) => path(densify(o)) ?? '';

  const regions = (layers.regions?.shapes ?? []).map((shape) => ({ ...shape, geometry: rewind(densify(shape.geometry)) }));
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" version="1.1" width="${W}" height="${f(H)}" viewBox="0 0 ${W} ${f(H)}">`);
  out.push(`<rect width="${W}" height="${f(H)}" fill="white"/>`);
  const outline = d(map.outline);
  out.push(`<defs><clipPath id="${id}-clip"><path d="${outline}"/></clipPath></defs>`);
  out.push(`<path class="ocean" d="${outline}" fill="${NEUTRALS.ocean}"/>`);
  out.push(`<g clip-path="url(#${id}-clip)">`);
  if (layers.raster && rasterScale) {
    const img = rasterImage(layers.raster.field, map, rasterScale, { extent, pixelRatio: options.pixelRatio, sampling: layers.raster.sampling });
    out.push(`<image x="${f(img.x)}" y="${f(img.y)}" width="${f(img.width)}" height="${f(img.height)}" preserveAspectRatio="none" xlink:href="${img.href}" href="${img.href}"/>`);
  }
  for (const shape of regions) {
    const fill = residualScale && shape.residual !== undefined ? residualScale.hex(shape.residual) : undefined;
    if (fill) out.push(`<path class="region-fill" d="${d(shape.geometry)}" fill="${fill}" fill-opacity="0.9"/>`);
  }
  if (layers.land !== false) out.push(`<path class="land" d="${d(landFeature())}" fill="${NEUTRALS.land}" stroke="${NEUTRALS.landStroke}" stroke-width="0.4"/>`);
  if (layers.graticule !== false) out.push(`<path class="graticule" d="${d(graticuleLines(layers.graticule ?? 30))}" fill="none" stroke="${NEUTRALS.graticule}" stroke-width="0.4" stroke-dasharray="1.5 1.5"/>`);
  for (const shape of regions) {
    out.push(`<path class="region" d="${d(shape.geometry)}" fill="none" stroke="${shape.flagged ? '#000000' : '#6e6e6e'}" stroke-width="${shape.flagged ? 1.4 : 0.5}"/>`);
  }
  for (const o of layers.outlines ?? []) out.push(`<path class="outline" d="${d(o.geometry)}" fill="none" stroke="#000000" stroke-width="0.9" stroke-dasharray="3 2"/>`);
  const pointsSvg = (x: number, y: number, fill: string) => `<circle cx="${f(x)}" cy="${f(y)}" r="2.2" fill="${fill}" stroke="#ffffff" stroke-width="0.4"/>`;
  for (const s of [...(layers.stations ?? [])].sort((a, b) => (a.cruise < b.cruise ? -1 : a.cruise > b.cruise ? 1 : 0))) {
    const p = map.visible(s.lon, s.lat) ? map.projection([s.lon, s.lat]) : null;
    if (p) out.push(pointsSvg(p[0], p[1], categoricalColour(cruises.indexOf(s.cruise))));
  }
  for (const c of layers.cells?.points ?? []) {
    const p = map.visible(c.lon, c.lat) ? map.projection([c.lon, c.lat]) : null;
    const fill = cellScale?.hex(c.value);
    if (p && fill) out.push(pointsSvg(p[0], p[1], fill).replace('r="2.2"', 'r="2.6"').replace('stroke="#ffffff"', 'stroke="#222222"'));
  }
  out.push('</g>');
  out.push(`<path class="frame" d="${outline}" fill="none" stroke="#555555" stroke-width="0.75"/>`);
  for (const shape of regions) {
    if (!shape.flagged) continue;
    const [cx, cy] = path.centroid(shape.geometry);
    if (!Number.isFinite(cx) || !Number.isFinite(cy)) continue;
    const label = escapeXml(shape.label ?? shape.id);
    const attrs = `x="${f(cx)}" y="${f(cy + 3)}" text-anchor="middle" font-family="${escapeXml(font)}" font-size="9px"`;
    out.push(`<text ${attrs} fill="none" stroke="#ffffff" stroke-width="2.5" stroke-linejoin="round">${label}</text><text ${attrs} fill="#000000">${label}</text>`);
  }
  if (options.title) out.push(`<text x="${pad}" y="14" font-family="${escapeXml(font)}" font-size="12px" font-weight="bold" fill="#222222">${escapeXml(options.title)}</text>`);
  let y = titleH + mapH + 4;
  bars.forEach((b, i) => {
    out.push(colourBar(b.scale, { x: pad + i * (barW + 16), y, width: barW, title: b.title, id: `${id}-bar${i}` }, text).svg);
  });
  y += barBlockH;
  if (swatches.length) {
    const row = swatchRow(swatches, { x: pad, y, width: innerW }, text);
    out.push(row.svg);
    y += row.height + 4;
  }
  captionLines.forEach((line, i) => {
    out.push(`<text x="${pad}" y="${f(y + (i + 1) * (text.fontSize + 3) - 3)}" font-family="${escapeXml(font)}" font-size="${text.fontSize}px" fill="#444444">${escapeXml(line)}</text>`);
  });
  out.push('</svg>');
  return { svg: out.join('\n'), width: W, height: H };
}
