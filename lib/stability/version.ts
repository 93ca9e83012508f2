/**
 * Version of the stability engine. Stored beside every saved run so a result can be
 * traced to the code that produced it; bump it whenever a factor of safety can change.
 */
export const ENGINE_VERSION = "1.2.0";
