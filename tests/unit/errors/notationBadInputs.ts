// Bad printed operators and operator lists (server/engine/notation), for engineMessages.test.ts.
import type { Theory } from '../../../shared/schemas/theory'
import { parseNotation, checkOperatorList } from '../../../server/engine/notation/index'
import { notationColumnTerms } from '../../../server/engine/notation/written'
import { basisSpecies, parseClassKey } from '../../../server/engine/basis/index'
import type { BadInput } from './badInputs'

const phi: Theory = { name: 'real scalar', frame: 'relativistic', groups: [], fields: [{ name: 'phi', lorentz: 'scalar', real: true }] }
const SM = { fields: ['H', 'W', 'L', 'e'] }

export const notationCases: BadInput[] = [
  { name: 'a printed operator with a field the theory lacks', run: () => parseNotation('H^\\dagger X', SM), says: /position 11 .*"X" is not a field of this theory/ },
  { name: 'a printed operator with an unclosed bracket', run: () => parseNotation('(H^\\dagger H', SM), says: /expected "\)" to close the bracket/ },
  { name: 'a printed derivative acting on nothing', run: () => parseNotation('H^\\dagger H D_\\mu', SM), says: /followed by the field/ },
  { name: 'an empty operator list', run: () => checkOperatorList(phi, 6, ['% nothing']), says: /list is empty/ },
  { name: 'an operator to keep that vanishes in its class', run: () => notationColumnTerms(phi, parseClassKey(basisSpecies(phi), 'phi^4'), '\\phi^4 - \\phi^4'), says: /nothing to keep/ },
]
