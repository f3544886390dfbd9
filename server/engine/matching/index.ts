/** Worked one-loop matching results (QED with a heavy charged fermion) and their exact checks. */
export * from './fieldInvariants'
export * from './vacuumPolarization'
export * from './library'
