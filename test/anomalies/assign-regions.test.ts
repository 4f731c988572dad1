import { describe, expect, it } from 'vitest';
import { assignRegions } from '../../lib/anomalies/assign-regions.js';
import { latLonBoxes } from '../../lib/geo/regions/lat-lon-boxes.js';
import { regionsFromGeoJson } from '../../lib/geo/regions/regions-from-geojson.js';
import { Ledger } from '../../lib/ledger/ledger.js';

describe('assignRegions', () => {
  it('assignRegions(rows, boxes) gives every row a box', () => {
    const r = assignRegions([{ lon: -167.5, lat: -42 }, { lon: 5, lat: 5 }], latLonBoxes(10));
    expect(r.regionIds).toEqual(['box-lat-50s_40s-lon-170w_160w', 'box-lat-0_10n-lon-0_10e']);
    expect(r.unassigned).toEqual([]);
  });

  it('assignRegions(rows, regions, ledger) ledgers rows outside every region or without position', () => {
    const regions = regionsFromGeoJson({ name: 'r.geojson', text: JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: { name: 'sq' }, geometry: { type: 'Polygon', coordinates: [[[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]]] } }] }) });
    const ledger = new Ledger();
    const r = assignRegions([{ lon: 5, lat: 5 }, { lon: 50, lat: 5, sourceFile: 'c.csv', sourceLine: 3 }, { lon: NaN, lat: 5, sourceFile: 'c.csv', sourceLine: 4 }], regions, ledger);
    expect(r.regionIds).toEqual(['sq', null, null]);
    expect(r.unassigned).toEqual([{ index: 1, reason: 'outside-regions' }, { index: 2, reason: 'no-position' }]);
    expect(ledger.entries.map((e) => [e.line, e.reason, e.detail])).toEqual([
      [3, 'outside-regions', 'cell at lon 50, lat 5 lies in none of the regions; it is left out of the regional anomaly tests'],
      [4, 'no-position', 'cell has no usable position (lon NaN, lat 5); it is left out of the regional anomaly tests'],
    ]);
  });
});
