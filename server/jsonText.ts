/**
 * JSON text of an answer. JSON.stringify itself writes NaN and the infinities as null
 * (ECMA-262, SerializeJSONProperty), which is how results carry an undefined
 * coefficient; answers go compact, without indentation, which a client does not need
 * and which costs the service time under load.
 */
export function jsonText(value: unknown): string {
  return JSON.stringify(value);
}
