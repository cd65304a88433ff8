/**
 * The engine's version, stamped on every analysis result so that a report or a saved result
 * says which set of formulas produced its numbers. Raise it whenever a change to src/core can
 * change a number a surveyor sees (a coefficient, a rule, a default); semantic versioning.
 *
 * Example: ENGINE_VERSION = '0.2.0'.
 */
export const ENGINE_VERSION = '0.2.0';
