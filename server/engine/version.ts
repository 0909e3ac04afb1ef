/** Engine version, reported in every RatingResult; bump on any change of a correlation or default. */
// 0.2.0: Kister & Haas provenance and valve-tray warnings
// 0.3.0: Klein moving-valve balance with the eddy loss coefficient C_vw (Ludwig Example 8-41); all-open
//        velocity and partly-open dry head reported
// 0.4.0: multipass pass layouts (per-pass weir loading, crest, downcomer velocity and backup; pass imbalance)
export const ENGINE_VERSION = '0.4.0';
