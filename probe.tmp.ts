import { parseGoldstoneOperator } from './server/engine/goldstone/explicit/parseGoldstone'
import { operatorText } from './server/engine/goldstone/explicit/monomial'
import { goldstoneBasis } from './server/engine/goldstone/explicit/goldstoneBasis'
const b = goldstoneBasis({ N: 3, sources: true, maxOrder: 4 })
let bad = 0
for (const o of b.byOrder) for (const op of [...o.kept, ...o.alternatives]) {
  const back = operatorText(parseGoldstoneOperator(op.text))
  if (back !== op.text) { bad++; console.log('MISMATCH', op.text, '→', back) }
}
console.log('checked', b.byOrder.reduce((n, o) => n + o.kept.length + o.alternatives.length, 0), 'bad', bad)
console.log(b.byOrder[1]!.kept.map(k => k.text).join('\n'))
for (const t of ['<u_mu>', '⟨u_μ u_ν⟩', 'i(⟨f+_μν u^μ u^ν⟩', '⟨u_μ u^μ u_ν⟩']) { try { parseGoldstoneOperator(t) } catch (e) { console.log((e as Error).message) } }
