/** Engine version, reported in every RatingResult; bump on any change of a correlation or default. */
// 0.2.0: Kister & Haas provenance and valve-tray warnings
// 0.3.0: Klein moving-valve balance with the eddy loss coefficient C_vw (Ludwig Example 8-41); all-open
//        velocity and partly-open dry head reported
// 0.4.0: multipass pass layouts (per-pass weir loading, crest, downcomer velocity and backup; pass imbalance)
// 0.5.0: valve-tray A_f from the open slot area; Fair beyond F_LV 1 along the fit's trend (conservative);
//        high-pressure derating warning only where it applies; range warnings for Fair's σ correction,
//        ρV/ρL and apron underflow; Kister & Haas h_ct uncertainty stated in the method's source (no
//        per-run warning), warning above σ 25 mN/m
// 0.6.0: Bennett's validity as data (froth regime: warned when the clear liquid is below the Kister & Haas
//        transition height; valve trays warned); the entrained-liquid rate at ψ past 0.999 is warned
// 0.7.0: valve trays: wet pressure drop h_d + β(h_w + h_ow) (Perry 8th ed. eq. 14-106) with β = (1 + φ)/2
//        from the Bennett froth density, no residual head (was Bennett's sieve-tray clear liquid and residual
//        head); Bennett's tray types and the Francis crest range (6–67.2 mm) as data; multipass: each pass's own
//        clear liquid and tray head behind its downcomer; a layout tray's crest, liquid and
//        Kister & Haas load on its own outlet weirs
// 0.8.0: the weep check of each tray type explicit (WEEP_METHODS): moving valves report
//        weepPointMovingValveClosedBalance (Klein's closed balance point as the weep limit, common practice),
//        fixed valves weepPointFixedValveFair (Fair's criterion with the valves taken as open, common practice)
//        with a section range warning (Fair's criterion is a sieve-tray one); values unchanged; the aeration
//        factor's stated uncertainty says the chart is not read; a flooded tray controls its section (and
//        the run) ahead of trays that are not flooded
export const ENGINE_VERSION = '0.8.0';
