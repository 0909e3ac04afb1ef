/**
 * Request schemas of the heat-recovery plans and of the load cases' pump-around duty tags (issue 17);
 * payload types in shared/types/heatPlans.ts and shared/types/loads.ts.
 */
const uuid = { type: 'string', format: 'uuid' } as const;
const version = { type: 'integer', minimum: 1 } as const;
/** a duty in kW: zero (pump-around off) up to a bound far above any column */
const duty = { type: 'number', minimum: 0, maximum: 1e6 } as const;

export const putPumpAroundDutiesBody = {
  type: 'object',
  additionalProperties: false,
  required: ['duties', 'version'],
  properties: {
    duties: {
      type: 'array',
      maxItems: 20,
      items: {
        type: 'object',
        additionalProperties: false,
        required: ['pumpAroundId', 'duty_kW'],
        properties: { pumpAroundId: uuid, duty_kW: duty },
      },
    },
    version,
  },
} as const;
