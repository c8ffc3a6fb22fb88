/** The service's version: in the OpenAPI document and, as the engine version, in every answer's audit. Kept equal to package.json's (a test holds them together). */
export const SERVICE_VERSION = '0.1.0';
