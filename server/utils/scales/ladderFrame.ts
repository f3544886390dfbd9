// Which counting frame a stored theory or basis is in: read on the request thread (no engine work).
/** The frame of a stored theory definition (relativistic when it names none). */
export function frameOfDefinition(definition: unknown): string {
  const frame = (definition as { frame?: unknown } | null)?.frame
  return typeof frame === 'string' ? frame : 'relativistic'
}

/** The frame of a stored basis: a Goldstone-frame basis marks its classes (as the board reads it). */
export function frameOfBasisClasses(classes: unknown): string {
  return Array.isArray(classes) && classes.some((c) => (c as { frame?: unknown }).frame === 'goldstone') ? 'goldstone' : 'relativistic'
}
