/**
 * The version of the device equations. Stored with every computed result, so a sheet can say when
 * its numbers were made by other equations. Raise it whenever a number the engine returns changes.
 */
export const ENGINE_VERSION = '2.1.0';
