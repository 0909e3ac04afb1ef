/** The cautions every pump-around study carries, on its page, its printed report and its exports. */
export const STUDY_CAUTIONS = [
  "Any change of pump-around duty goes through management-of-change review and your site's procedures, with a pre-start-up review where they require it.",
  'Relief scenarios and flare loads change with the duty (loss of the pump-around or its cooling, power failure): have them re-checked.',
  'Fractionation above the zone suffers as its internal reflux and L/V fall; watch product cut points and flash points.',
  'Vapour and liquid properties are held at the base case. Confirm with the internals vendor and licensed engineers; local codes and practice govern.',
];
