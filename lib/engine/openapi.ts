import { z } from 'zod';
import { PRESET_IDS } from '../thermo/presets';
import { SPECIES_IDS } from '../thermo/species-data';
import { ENGINE_VERSION } from './calculate-core';
import {
  accessResponses,
  accessSchemas,
  apiKeySecurityScheme,
  calculateSecurity,
  errorsRef,
  rateLimitResponseHeaders,
} from './openapi-access';
import { sizingRequestSchema } from './schema';
import { JSON_SCHEMA_HINTS } from './schema-fields';

const quantityOut = { type: 'object', properties: { value: { type: 'number' }, unit: { type: 'string' } } };
const num = { type: 'number' };
const stage = {
  type: 'object',
  required: ['stage', 'pressureRatio', 'inletTemperatureC', 'dischargeTemperatureC', 'gasPowerKw'],
  properties: {
    ...Object.fromEntries(
      [
        'stage',
        'pressureRatio',
        'inletPressureKpa',
        'dischargePressureKpa',
        'inletTemperatureC',
        'dischargeTemperatureC',
        'isentropicDischargeTemperatureC',
        'specificWorkKjPerKg',
        'gasPowerKw',
        'k',
        'cpJPerKgK',
        'massFlowKgPerS',
        'inletZ',
        'dischargeZ',
        'inletDensityKgPerM3',
        'dischargeDensityKgPerM3',
        'inletActualFlowM3PerH',
        'inletActualFlowAcfm',
        'dischargeActualFlowM3PerH',
        'isentropicHeadKjPerKg',
        'polytropicHeadKjPerKg',
        'isentropicHeadM',
        'polytropicHeadM',
        'isentropicHeadFt',
        'polytropicHeadFt',
        'isentropicEfficiency',
        'polytropicEfficiency',
        'polytropicExponent',
      ].map((k) => [k, num]),
    ),
    cooler: {
      type: ['object', 'null'],
      description: 'the cooler after this stage (intercooler, or the aftercooler after the last), with any condensate',
      properties: {
        kind: { enum: ['intercooler', 'aftercooler'] },
        outletTemperatureC: num,
        outletPressureKpa: num,
        dutyKw: num,
        latentDutyKw: num,
        condensateKgPerH: num,
      },
    },
  },
};

const method = {
  type: 'object',
  required: ['k', 'cpJPerKgK', 'gasPowerKw', 'stages', 'intercoolerDutiesKw'],
  properties: {
    k: num,
    cpJPerKgK: num,
    gasPowerKw: num,
    specificWorkKjPerKg: num,
    totalIntercoolerDutyKw: num,
    stages: { type: 'array', items: stage },
    intercoolerDutiesKw: { type: 'array', items: num, description: 'between stages only: N-1 entries' },
    aftercoolerDutyKw: { type: ['number', 'null'] },
    condensateKgPerH: num,
    polytropicSteps: { type: ['integer', 'null'] },
  },
};
/** Response schema of the main fields; the full shape is the SizingResult type. */
const result = {
  type: 'object',
  required: ['service', 'massFlowKgPerS', 'warnings', 'basis'],
  properties: {
    service: { enum: ['heater', 'compressor'] },
    massFlowKgPerS: num,
    molarMassKgPerKmol: num,
    inletActualFlowM3PerH: num,
    heater: {
      type: 'object',
      properties: {
        ...Object.fromEntries(
          [
            'absorbedDutyKw',
            'idealGasDutyKw',
            'averageCpDutyKw',
            'averageCpDifferencePercent',
            'cpMeanJPerKgK',
            'heatLossKw',
            'marginKw',
            'designDutyKw',
            'outletActualFlowM3PerH',
          ].map((k) => [k, num]),
        ),
        selectedRatingKw: { type: ['number', 'null'] },
        idealGasDifferencePercent: { type: ['number', 'null'] },
      },
    },
    compressor: {
      type: 'object',
      properties: {
        basis: {
          enum: ['constant-k', 'variable-cp', 'real-gas'],
          description: 'the method of the headline figures: real-gas whenever a real-gas equation of state is used',
        },
        constantK: method,
        variableCp: method,
        realGas: { anyOf: [method, { type: 'null' }], description: 'on the real-gas equation of state' },
        idealGasDifferencePercent: { type: ['number', 'null'] },
        shaftPowerKw: num,
        methodDifferencePercent: num,
        isentropicEfficiency: num,
        suggestedStages: { type: ['integer', 'null'] },
        motor: {
          type: 'object',
          properties: {
            iecKw: { type: ['number', 'null'] },
            nemaHp: { type: ['number', 'null'] },
            marginPercent: { type: ['number', 'null'] },
          },
        },
      },
    },
    warnings: {
      type: 'array',
      items: {
        type: 'object',
        required: ['code', 'severity', 'message'],
        properties: {
          code: { type: 'string' },
          severity: { enum: ['info', 'caution', 'warning', 'danger'] },
          message: { type: 'string' },
        },
      },
    },
    inletZ: num,
    inletDensityKgPerM3: num,
    basis: {
      type: 'object',
      properties: {
        equationOfState: { enum: ['ideal-gas', 'peng-robinson', 'gerg-2008'] },
        equationOfStateReason: { type: 'string' },
        equationOfStateSource: { type: 'string' },
        standardVolumeBasis: { type: 'string' },
      },
      additionalProperties: true,
    },
  },
  additionalProperties: true,
};

type JsonObject = { properties?: Record<string, JsonObject>; required?: string[]; oneOf?: JsonObject[] };

// zod treats transform leaves as optional on input, so required quantities are restored here.
const REQUIRED_QUANTITIES: Record<string, string[]> = {
  heater: ['flow', 'outletTemperature'],
  compressor: ['flow', 'dischargePressure'],
};

function requestSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(sizingRequestSchema, {
    io: 'input',
    target: 'draft-2020-12',
    // Leaf fields are transforms (coercion and range in one step); their JSON Schema is recorded beside them.
    unrepresentable: (ctx) => JSON_SCHEMA_HINTS.get(ctx.zodSchema) ?? 'any',
  }) as JsonObject;
  for (const option of schema.oneOf ?? []) {
    const service = (option.properties?.service as { const?: string } | undefined)?.const ?? '';
    option.required = [...new Set([...(option.required ?? []), ...(REQUIRED_QUANTITIES[service] ?? [])])];
    const inlet = option.properties?.inlet;
    if (inlet) inlet.required = ['temperature', 'pressure'];
  }
  return schema as Record<string, unknown>;
}

let cached: Record<string, unknown> | undefined;

/** OpenAPI 3.1 document for POST /api/v1/calculate, generated from the request schema. */
export function calculateOpenApiDocument(): Record<string, unknown> {
  cached ??= {
    openapi: '3.1.0',
    info: {
      title: 'Dutywise sizing API',
      version: ENGINE_VERSION,
      description:
        'Preliminary sizing of electric process gas heaters and gas compressors on real-gas properties ' +
        '(GERG-2008 or Peng-Robinson, chosen by "equationOfState" or by the engine) or on ideal-gas properties. ' +
        'A liquid or two-phase inlet is refused. ' +
        `Gas presets: ${PRESET_IDS.join(', ')}. Mixture species: ${SPECIES_IDS.join(', ')} ` +
        '(common names such as methane, nC4 or hydrogen sulfide are accepted too).',
    },
    paths: {
      '/api/v1/calculate': {
        post: {
          summary: 'Size a heater or a compressor for one duty point',
          security: calculateSecurity,
          requestBody: {
            required: true,
            content: { 'application/json': { schema: { $ref: '#/components/schemas/SizingRequest' } } },
          },
          responses: {
            200: {
              description: 'Sizing result',
              headers: rateLimitResponseHeaders,
              content: { 'application/json': { schema: { $ref: '#/components/schemas/SizingResult' } } },
            },
            400: {
              description: 'Invalid JSON or refused fields (every one listed)',
              content: { 'application/json': { schema: errorsRef } },
            },
            413: { description: 'Body larger than 64 KiB', content: { 'application/json': { schema: errorsRef } } },
            ...accessResponses,
          },
        },
      },
    },
    components: {
      schemas: { SizingRequest: requestSchema(), SizingResult: result, Quantity: quantityOut, ...accessSchemas },
      securitySchemes: apiKeySecurityScheme,
    },
  };
  return cached;
}
