import { computeRequestSchemas, type ComputeRoute } from '@hopwise/common';
import type { SchemaObject } from '@nestjs/swagger';
import { z } from 'zod';

/**
 * OpenAPI descriptions of the compute routes. Request bodies are generated from the zod schemas
 * the server validates with (common/src/compute/schemas.ts), so the document cannot drift from
 * the validation; responses are described by hand from SPEC §3.
 */

interface RouteDoc {
  summary: string;
  description: string;
  requestSchema: SchemaObject;
  responseSchema: SchemaObject;
}

/** Request schema as sent (defaults optional), in OpenAPI 3.0 form. */
function requestSchema(route: ComputeRoute): SchemaObject {
  const { $schema: _drop, ...schema } = z.toJSONSchema(computeRequestSchemas[route], {
    io: 'input',
    target: 'openapi-3.0',
    unrepresentable: 'any',
  }) as Record<string, unknown>;
  return schema as SchemaObject;
}

const num = (description: string): SchemaObject => ({ type: 'number', description });
const nullableNum = (description: string): SchemaObject => ({
  type: 'number',
  nullable: true,
  description,
});
const object = (properties: Record<string, SchemaObject>): SchemaObject => ({
  type: 'object',
  properties,
  required: Object.keys(properties),
});
const mufByHops: SchemaObject = {
  type: 'object',
  description: 'Highest frequency with an n-hop solution at this range, keyed by n ("1", "2", …)',
  additionalProperties: { type: 'number', nullable: true },
};

const RESPONSES: Record<ComputeRoute, SchemaObject> = {
  plasma: object({
    plasmaFrequencyMHz: num('f_p = (1/2π)·sqrt(N e²/(ε₀ mₑ))'),
    electronDensityPerM3: num('N'),
    propagates: { type: 'boolean', description: 'f > f_p' },
    refractiveIndex: nullableNum('μ = sqrt(1 − f_p²/f²); null when it does not propagate'),
    groupIndex: nullableNum("μ' = 1/μ"),
    phaseVelocityMps: nullableNum('c/μ'),
    groupVelocityMps: nullableNum('c·μ'),
  }),
  vertical: object({
    criticalFrequenciesMHz: {
      type: 'object',
      additionalProperties: { type: 'number' },
      description: 'Plasma frequency of the summed profile at each layer peak (samples: peak1, …)',
    },
    echoes: {
      type: 'array',
      items: object({
        frequencyMHz: num('Sounding frequency'),
        reflected: { type: 'boolean' },
        trueHeightKm: nullableNum('Reflection height'),
        virtualHeightKm: nullableNum("∫ μ' dh, one way"),
        phaseHeightKm: nullableNum('∫ μ dh, one way'),
        groupDelayMs: nullableNum('2·virtualHeightKm/c (round trip)'),
      }),
    },
  }),
  oblique: {
    ...object({
      modes: {
        type: 'array',
        items: object({
          label: { type: 'string', example: '1F2' },
          hops: { type: 'integer' },
          layer: { type: 'string' },
          ray: { type: 'string', enum: ['low', 'high'] },
          elevationDeg: num('Take-off elevation'),
          apexHeightKm: num('Height where the ray turns'),
          groupPathKm: num("P' = ∫ μ' ds, all hops"),
          phasePathKm: num('P = ∫ μ ds, all hops'),
          groupDelayMs: num("P'/c"),
          phaseAdvanceKm: num("P' − P"),
          phaseAdvanceCycles: num("(P' − P)·f/c"),
        }),
      },
      mufMHz: mufByHops,
      multipathSpreadMs: nullableNum('max − min group delay over the modes; null for none'),
    }),
    required: ['modes', 'multipathSpreadMs'],
  },
  slant: object({
    slantTecu: num('TEC along the straight slant path, 1 TECU = 1e16 m⁻²'),
    verticalTecu: num('TEC straight up to topHeightKm'),
    groupDelayExcessNs: num("∫(μ' − 1) ds / c"),
    phaseAdvanceNs: num('∫(1 − μ) ds / c'),
    firstOrderDelayNs: num('40.3·TEC/(c·f²) (ITU-R P.531)'),
    groupDelayExcessM: num("∫(μ' − 1) ds"),
    phaseAdvanceM: num('∫(1 − μ) ds'),
  }),
  invert: object({
    samples: {
      type: 'array',
      items: object({
        heightKm: num('True height'),
        plasmaFrequencyMHz: num('f_p'),
        electronDensityPerM3: num('N'),
      }),
    },
  }),
};

const TEXT: Record<ComputeRoute, [summary: string, description: string]> = {
  plasma: [
    'Plasma frequency, refractive and group index, phase and group velocity',
    'Give exactly one of electronDensityPerM3 or plasmaFrequencyMHz, and the wave frequency.',
  ],
  vertical: [
    'Vertical-incidence echoes (synthetic ionogram) from a profile',
    'True, virtual and phase height and round-trip group delay per frequency.',
  ],
  oblique: [
    'Sky-wave modes, MUF per hop count and multipath spread at a ground range',
    'One mode per take-off elevation whose n equal hops cover the range.',
  ],
  slant: [
    'Slant TEC, excess group delay and phase advance on a straight trans-ionospheric path',
    '422 when the frequency is at or below the highest plasma frequency on the path.',
  ],
  invert: [
    'True-height profile from a vertical-incidence trace (lamination)',
    'Frequencies strictly ascending, at least 5 points; monotonic profile without a valley.',
  ],
};

export const COMPUTE_DOCS = Object.fromEntries(
  (Object.keys(TEXT) as ComputeRoute[]).map((route) => [
    route,
    {
      summary: TEXT[route][0],
      description: TEXT[route][1],
      requestSchema: requestSchema(route),
      responseSchema: RESPONSES[route],
    },
  ]),
) as Record<ComputeRoute, RouteDoc>;
