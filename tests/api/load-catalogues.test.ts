import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { buildApp } from '../../src/app.js';
import { CatalogueFileError, loadCatalogues } from '../../src/api/load-catalogues.js';

/** A fictional shelving maker's own upright section and coil grade. */
const brightrack = {
  sections: [
    {
      designation: 'BR-UPRIGHT 90',
      family: 'BR-UPRIGHT',
      massPerLength: '4.1 kg/m',
      section: { shape: 'box', width: '90 mm', depth: '70 mm', wallThickness: '2 mm', outerCornerRadius: '4 mm' },
    },
  ],
  materials: [{ grade: 'BR-S420MC', elasticModulus: '210 GPa', yieldStrength: '420 MPa', ultimateStrength: '480 MPa', density: 7850 }],
};

function folderWith(files: Record<string, unknown>): string {
  const folder = mkdtempSync(join(tmpdir(), 'memberproof-catalogue-'));
  for (const [name, content] of Object.entries(files)) writeFileSync(join(folder, name), typeof content === 'string' ? content : JSON.stringify(content));
  return folder;
}

describe('company catalogues', () => {
  it('adds a folder of files to the embedded catalogues, converting units', async () => {
    const catalogues = await loadCatalogues({ companyPath: folderWith({ 'brightrack.json': brightrack }) });
    const upright = catalogues.sections.find('br-upright 90');
    expect(upright?.massPerLength).toBeCloseTo(4.1, 12);
    expect(upright?.dimensions).toMatchObject({ shape: 'box', width: 0.09, depth: 0.07 });
    expect(catalogues.materials.find('br-s420mc')?.yieldStrength).toBeCloseTo(420e6, 3);
    expect(catalogues.sources).toHaveLength(2);
    expect(catalogues.sources[1]).toMatchObject({ sections: 1, materials: 1 });
  });

  it('uses them in a check and reports them in /readyz', async () => {
    const app = await buildApp({ companyCataloguePath: folderWith({ 'brightrack.json': brightrack }) });
    const ready = await request(app.server).get('/readyz');
    expect(ready.body.sectionFamilies['BR-UPRIGHT']).toBe(1);
    const check = await request(app.server)
      .post('/v1/member-checks')
      .send({
        member: { length: '1.2 m', supports: [{ position: 0, type: 'pinned' }, { position: '1.2 m', type: 'roller' }] },
        section: { designation: 'BR-UPRIGHT 90' },
        material: { grade: 'BR-S420MC' },
        loads: [{ type: 'point', position: '0.6 m', fy: '-2 kN' }],
        selfWeight: false,
      });
    expect(check.status).toBe(200);
    expect(check.body.reactions[0].fy).toBeCloseTo(1000, 9);
    await app.close();
  });

  it('stops start-up on a bad entry, naming the file and the field', async () => {
    const bad = { sections: [{ ...brightrack.sections[0], section: { shape: 'box', width: '90 mm', depth: '70 mm', wallThickness: '3 kN' } }] };
    const folder = folderWith({ 'bad.json': bad });
    await expect(loadCatalogues({ companyPath: folder })).rejects.toThrow(CatalogueFileError);
    await expect(loadCatalogues({ companyPath: folder })).rejects.toThrow(/bad\.json: \/sections\/0\/section\/wallThickness/);
  });

  it('stops start-up on a designation the catalogues already hold', async () => {
    const duplicate = { sections: [{ ...brightrack.sections[0], designation: 'IPE 200' }] };
    await expect(loadCatalogues({ companyPath: folderWith({ 'dup.json': duplicate }) })).rejects.toThrow(/dup\.json.*IPE 200/);
  });

  it('stops start-up on a file that is not JSON, or a path that does not exist', async () => {
    await expect(loadCatalogues({ companyPath: folderWith({ 'broken.json': '{ "sections": [' }) })).rejects.toThrow(/broken\.json/);
    await expect(loadCatalogues({ companyPath: '/no/such/catalogue.json' })).rejects.toThrow(/no such file/);
  });
});
