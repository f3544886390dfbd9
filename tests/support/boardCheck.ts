import { testDb } from './db'
import { boardHealth as healthIn } from './boardHealth'

/** The board's invariants on the test database (see boardHealth.ts). */
export function boardHealth(basisId: number) {
  return healthIn(testDb(), basisId)
}

export async function operatorVersion(id: number): Promise<number> {
  return (await testDb()('operators').where({ id }).first('version')).version as number
}
