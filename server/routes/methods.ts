import { implement } from '../http/route.js';
import { ENGINE_VERSION, METHOD_METADATA, METHOD_USES } from '../engine/index.js';
import limitsTable from '../../reference-tables/limits.json' with { type: 'json' };
import { PROVENANCE_UNCERTAINTY, publishedSource } from '../../shared/labels.js';
import { LIMIT_SENSES, methodsContract, type MethodsPayload } from '../../shared/contract/methods.js';

/** Cautions printed with every rating (usual cautions of the trade for operating changes and column entry). */
export const RATING_CAUTIONS = [
  'Results are screening estimates from published correlations; they are not a vendor rating or a design guarantee.',
  'Any operating change (rate increase, pump-around duty change) goes through management-of-change review, with a pre-start-up safety review where applicable.',
  'Confirm the rating with the internals vendor and licensed engineers before acting on it; site permits and local codes govern.',
];

function sense(check: string, s: string): (typeof LIMIT_SENSES)[number] {
  const known = LIMIT_SENSES.find((k) => k === s);
  if (!known) throw new Error(`reference-tables/limits.json: the sense of ${check} is neither min nor max`);
  return known;
}

const payload: MethodsPayload = {
  engineVersion: ENGINE_VERSION,
  methods: Object.values(METHOD_METADATA)
    .map((m) => ({
      id: m.id,
      label: m.label,
      source: publishedSource(m.source),
      equation: m.equation,
      provenance: m.provenance,
      ranges: m.ranges,
      uncertainty: m.uncertainty ?? PROVENANCE_UNCERTAINTY[m.provenance],
      uses: METHOD_USES[m.id] ?? [],
      trayTypes: m.trayTypes ?? null,
    }))
    .sort((a, b) => a.label.localeCompare(b.label)),
  limits: limitsTable.map((r) => ({
    check: r.check,
    limit: r.limit,
    unit: r.unit,
    sense: sense(r.check, r.sense),
    note: publishedSource(r.note),
    source: publishedSource(r.source),
  })),
  cautions: RATING_CAUTIONS,
};

export const methodRoutes = [implement(methodsContract.list)({ handler: () => payload })];
