/** Engine version, reported in every RatingResult; bump on any change of a correlation or default. */
export const ENGINE_VERSION = '0.2.0'; // 0.2.0: Kister & Haas provenance and valve-tray warnings
