/** The cautions every heat-recovery plan carries, on its page, its printed report and its exports. */
export const HEAT_PLAN_CAUTIONS = [
  'These are screening estimates. Any change of pump-around duties goes through management-of-change review and your site’s procedures, with a pre-start-up review where they require it.',
  'Confirm the chosen duties with the internals vendor and licensed engineers before operating there; local codes and practice govern.',
  'Relief scenarios and flare loads change with the duties (loss of a pump-around or its cooling, power failure): have them re-checked.',
  'Fractionation above each zone suffers as its internal reflux and L/V fall; watch product cut points and flash points.',
  'Away from the simulation cases the traffic comes from a shortcut model (constant latent heat per zone; vapour and liquid properties held at the base case unless fitted to simulation cases); the fit quality shown says how far it agrees with the cases it was fitted to.',
];
