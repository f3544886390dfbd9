import { selectOrder } from './server/engine/goldstone/explicit/goldstoneBasis'
for (const N of [2, 3]) {
  const t = performance.now()
  selectOrder(6, N, { N, sources: true, maxOrder: 6 }, () => {})
  console.log('select p6 N', N, Math.round(performance.now() - t), 'ms')
}
