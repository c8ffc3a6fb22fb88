/**
 * The moving-load envelope is exact: it bounds the analysis of every train position (property), and
 * it is reached (the bound is attained at some position).
 */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { DIAGRAM_FIELDS, type MemberAnalysis, type MemberPiece } from '../../../src/engine/analysis/result.js';
import { evaluatePolynomial } from '../../../src/engine/analysis/polynomial.js';
import { trainLoads } from '../../../src/engine/combinations/combined-loads.js';
import { envelopePositions, type EnvelopePositions } from '../../../src/engine/combinations/diagram-envelope.js';
import type { MovingLoadModel } from '../../../src/engine/combinations/load-actions.js';
import { influenceLines } from '../../../src/engine/combinations/influence-lines.js';
import { REACTION_COMPONENTS, trainEnvelope } from '../../../src/engine/combinations/train-envelope.js';
import type { MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import { DEMO_STIFFNESS, fixedAt, pinnedAt, rollerAt, supportAt } from '../member/model-builders.js';

function valueAt(analysis: MemberAnalysis, positions: EnvelopePositions, field: (typeof DIAGRAM_FIELDS)[number], k: number): number {
  const x = positions.x[k] as number;
  const right = positions.sides[k] === 'right';
  const piece = analysis.pieces.find((candidate, i) => (right ? x >= candidate.start && (x < candidate.end || i === analysis.pieces.length - 1) : x > candidate.start && x <= candidate.end) || (i === 0 && x === 0)) as MemberPiece;
  return evaluatePolynomial(piece.fields[field], x - piece.start);
}

/** Invented members of a shelving maker: simple spans, a continuous two-bay beam, a propped cantilever with an overhang, a hinged beam, a beam on a spring. */
const members = fc.oneof(
  fc.record({ length: fc.double({ min: 1, max: 8, noNaN: true }) }).map(({ length }) => ({ length, supports: [pinnedAt(0), rollerAt(length)], hinges: [] as number[] })),
  fc.record({ length: fc.double({ min: 2, max: 10, noNaN: true }), middle: fc.double({ min: 0.3, max: 0.7, noNaN: true }) }).map(({ length, middle }) => ({
    length,
    supports: [pinnedAt(0), rollerAt(middle * length), rollerAt(length)],
    hinges: [] as number[],
  })),
  fc.record({ length: fc.double({ min: 1, max: 6, noNaN: true }), prop: fc.double({ min: 0.5, max: 0.9, noNaN: true }) }).map(({ length, prop }) => ({
    length,
    supports: [fixedAt(0), rollerAt(prop * length)],
    hinges: [] as number[],
  })),
  // A hinged two-bay beam (fixed, hinge, roller) and a beam on a spring support in the middle.
  fc.record({ length: fc.double({ min: 2, max: 8, noNaN: true }), hinge: fc.double({ min: 0.2, max: 0.45, noNaN: true }) }).map(({ length, hinge }) => ({
    length,
    supports: [fixedAt(0), rollerAt(length)],
    hinges: [hinge * length],
  })),
  fc.record({ length: fc.double({ min: 2, max: 8, noNaN: true }), stiffness: fc.double({ min: 1e5, max: 1e8, noNaN: true }) }).map(({ length, stiffness }) => ({
    length,
    supports: [pinnedAt(0), supportAt(0.5 * length, { uy: { spring: stiffness }, uz: { spring: stiffness } }), rollerAt(length)],
    hinges: [] as number[],
  })),
);

/** Trains of 1 to 3 axles at least 0.1 m apart, each carrying 0.5 kN to 20 kN down (or up) and a sideways force. */
const trains = fc
  .array(fc.record({ gap: fc.double({ min: 0.1, max: 1, noNaN: true }), fy: fc.double({ min: 500, max: 20e3, noNaN: true }), up: fc.boolean(), fz: fc.double({ min: -2e3, max: 2e3, noNaN: true }) }), { minLength: 1, maxLength: 3 })
  .map((axles) => {
    let offset = -axles[0]!.gap;
    return axles.map(({ gap, fy, up, fz }) => ({ offset: (offset += gap), fy: up ? fy : -fy, fz }));
  });

describe('trainEnvelope', () => {
  it('bounds the fields and reactions of every position of the train, and reaches its bounds (property)', () => {
    fc.assert(
      fc.property(members, trains, fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 5, maxLength: 5 }), fc.integer({ min: 3, max: 15 }), (shape, axles, fractions, samples) => {
        const member: Omit<MemberModel, 'loads'> = { length: shape.length, supports: shape.supports as SupportModel[], hinges: shape.hinges.map((position) => ({ position })), stiffness: DEMO_STIFFNESS };
        const spread = Math.max(...axles.map((axle) => axle.offset));
        const train: MovingLoadModel = { id: 't', category: 'imposed', axles, from: -spread, to: shape.length, step: shape.length / 20 };
        const nodes = [0, shape.length, ...member.supports.map((support) => support.position), ...shape.hinges];
        const positions = envelopePositions(shape.length, samples, nodes);
        const envelope = trainEnvelope(influenceLines(member, positions), train);
        for (const fraction of fractions) {
          const p = train.from + fraction * (train.to - train.from);
          const analysis = analyseMember({ ...member, loads: trainLoads(train, p, 1, shape.length) });
          for (const field of DIAGRAM_FIELDS) {
            const scale = Math.max(1e-12, ...envelope.max[field].map(Math.abs), ...envelope.min[field].map(Math.abs));
            for (let k = 0; k < positions.x.length; k++) {
              const value = valueAt(analysis, positions, field, k);
              expect(value).toBeLessThanOrEqual((envelope.max[field][k] as number) + 1e-9 * scale + 1e-15);
              expect(value).toBeGreaterThanOrEqual((envelope.min[field][k] as number) - 1e-9 * scale - 1e-15);
            }
          }
          analysis.reactions.forEach((reaction, s) => {
            for (const component of REACTION_COMPONENTS) {
              const bounds = envelope.reactions[s] as (typeof envelope.reactions)[number];
              const scale = Math.max(1e-12, Math.abs(bounds.max[component].value), Math.abs(bounds.min[component].value));
              expect(reaction[component]).toBeLessThanOrEqual(bounds.max[component].value + 1e-9 * scale + 1e-15);
              expect(reaction[component]).toBeGreaterThanOrEqual(bounds.min[component].value - 1e-9 * scale - 1e-15);
            }
          });
        }
        // Reached: the largest reaction fy is what an analysis at its load position gives, or, where an
        // axle leaves the member there, the limit from one side (checked a hair to either side).
        envelope.reactions.forEach((bounds, s) => {
          const scale = Math.max(Math.abs(bounds.max.fy.value), Math.abs(bounds.min.fy.value), 1);
          const misses = [-1e-7, 0, 1e-7].map((shift) => {
            const at = analyseMember({ ...member, loads: trainLoads(train, bounds.max.fy.loadPosition + shift * shape.length, 1, shape.length) });
            return Math.abs((at.reactions[s] as (typeof at.reactions)[number]).fy - bounds.max.fy.value);
          });
          expect(Math.min(...misses)).toBeLessThanOrEqual(1e-6 * scale);
        });
      }),
      { numRuns: 60 },
    );
  });

  it('gives the largest midspan moment and end reaction of a simple span under one moving load: P L / 4 and P', () => {
    // A single load P on a simple span: M(L/2) is largest with the load at midspan, P L / 4; the end
    // reaction is largest, P, with the load over the support (AISC Manual, beam diagrams, case 7, from memory).
    const length = 6;
    const member: Omit<MemberModel, 'loads'> = { length, supports: [pinnedAt(0), rollerAt(length)], hinges: [], stiffness: DEMO_STIFFNESS };
    const train: MovingLoadModel = { id: 't', category: 'imposed', axles: [{ offset: 0, fy: -10e3, fz: 0 }], from: 0, to: length, step: 0.5 };
    const positions = envelopePositions(length, 3, [0, length]);
    const envelope = trainEnvelope(influenceLines(member, positions), train);
    expect(positions.x).toEqual([0, 3, 6]);
    expect(envelope.max.momentZ[1]).toBeCloseTo((10e3 * length) / 4, 6);
    expect(envelope.min.momentZ[1]).toBeCloseTo(0, 6);
    expect((envelope.reactions[0] as (typeof envelope.reactions)[number]).max.fy.value).toBeCloseTo(10e3, 6);
    expect((envelope.reactions[0] as (typeof envelope.reactions)[number]).max.fy.loadPosition).toBeCloseTo(0, 9);
  });
});
