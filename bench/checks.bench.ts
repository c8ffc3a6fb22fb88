/**
 * Engine time of the failure checks and of the section properties: checkMember alone (the analysis
 * and the section made beforehand) for an ordinary simply supported beam and for a cantilever in
 * compression (the buckling and beam-column path), and sectionProperties for an I-section, a rounded
 * box, a tee and an angle. run() returns the table as text.
 */

import { Bench } from 'tinybench';
import { embeddedMaterials } from '../src/catalogues/embedded-materials.js';
import { analyseMember } from '../src/engine/analysis/analyse-member.js';
import { checkMember } from '../src/engine/checks/check-member.js';
import type { MemberCheckInput } from '../src/engine/checks/check-input.js';
import type { Material } from '../src/engine/materials/material.js';
import type { LoadModel, MemberModel, SupportModel } from '../src/engine/member/model.js';
import { fixed, pinned, point, roller, uniform } from './member-models.js';
import type { SectionDimensions } from '../src/engine/sections/dimensions.js';
import { sectionProperties } from '../src/engine/sections/section-from-dimensions.js';
import type { SectionProperties } from '../src/engine/sections/section-properties.js';
import { memberStiffness } from '../src/engine/member/member-stiffness.js';

/** IPE 200 as EN 10365 dimensions it (values from memory, as in the catalogue). */
const IPE_200: SectionDimensions = {
  shape: 'i-section',
  depth: 0.2,
  flangeWidth: 0.1,
  webThickness: 0.0056,
  flangeThickness: 0.0085,
  rootRadius: 0.012,
};

/** Shapes timed for sectionProperties: the I above, a cold-formed square box with ro = 2 t, a tee and an angle. */
const SHAPES: readonly { readonly name: string; readonly dimensions: SectionDimensions }[] = [
  { name: 'sectionProperties, I-section (IPE 200)', dimensions: IPE_200 },
  {
    name: 'sectionProperties, rounded box 100 x 100 x 5, ro 10 mm',
    dimensions: { shape: 'box', width: 0.1, depth: 0.1, wallThickness: 0.005, outerCornerRadius: 0.01 },
  },
  {
    name: 'sectionProperties, tee 100 x 100 x 10, r 8 mm',
    dimensions: { shape: 'tee', depth: 0.1, flangeWidth: 0.1, webThickness: 0.01, flangeThickness: 0.01, rootRadius: 0.008 },
  },
  {
    name: 'sectionProperties, angle 100 x 100 x 10, r 12 mm',
    dimensions: { shape: 'angle', legY: 0.1, legZ: 0.1, thickness: 0.01, rootRadius: 0.012 },
  },
];

function modelOf(length: number, supports: readonly SupportModel[], loads: readonly LoadModel[], section: SectionProperties, material: Material): MemberModel {
  return {
    length,
    supports,
    hinges: [],
    loads,
    stiffness: memberStiffness(section, material),
  };
}

function steelS355(): Material {
  const material = embeddedMaterials().find((entry) => entry.grade === 'S355');
  if (material === undefined) throw new Error('S355 is missing from the embedded materials');
  return material;
}

/** A 4 m shelving beam of a fictional maker: 8 kN/m and 10 kN at 1.5 m, pinned and on a roller. */
function simpleBeam(section: SectionProperties, material: Material): MemberCheckInput {
  const model = modelOf(4, [pinned(0), roller(4)], [uniform(0, 4, -8e3), point(1.5, { fy: -10e3 })], section, material);
  return { analysis: analyseMember(model), model, section, material };
}

/** A 2.5 m platform post fixed at its foot: 150 kN down its axis and 5 kN sideways at the tip, with moment amplification. */
function compressedCantilever(section: SectionProperties, material: Material): MemberCheckInput {
  const model = modelOf(2.5, [fixed(0)], [point(2.5, { fx: -150e3, fy: -5e3 })], section, material);
  return { analysis: analyseMember(model), model, section, material, buckling: { amplification: true } };
}

export async function run(): Promise<string> {
  const material = steelS355();
  const ipe200 = sectionProperties(IPE_200);
  const beam = simpleBeam(ipe200, material);
  const cantilever = compressedCantilever(ipe200, material);
  const bench = new Bench({ time: 1000, warmupTime: 300 });
  bench.add('checkMember, IPE 200 simple span, UDL + point load', () => {
    checkMember(beam);
  });
  bench.add('checkMember, IPE 200 cantilever in compression (buckling, amplification)', () => {
    checkMember(cantilever);
  });
  for (const shape of SHAPES) {
    bench.add(shape.name, () => {
      sectionProperties(shape.dimensions);
    });
  }
  await bench.run();
  const lines = ['| case | mean (us) | samples |', '| --- | ---: | ---: |'];
  for (const task of bench.tasks) {
    const latency = task.result && 'latency' in task.result ? task.result.latency : undefined;
    lines.push(`| ${task.name} | ${((latency?.mean ?? Number.NaN) * 1000).toFixed(2)} | ${latency?.samplesCount ?? 0} |`);
  }
  return lines.join('\n');
}
