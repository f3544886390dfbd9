import type { BasisReport } from '../../server/engine/basis/buildBasis'

/**
 * The classes and kept operators of an engine-built basis in the shape the app stores them
 * (numbered from 1), ready for assembleExport in export tests.
 */
export function storedRows(report: BasisReport) {
  let id = 0
  const classes = report.byDimension.flatMap((d) => d.classes.map((c) => ({ order: d.order, dimension: d.dimension, key: c.key, rank: c.rank, hilbert: c.hilbert, tallyOk: c.tallyOk })))
  const operators = report.byDimension.flatMap((d) =>
    d.classes.flatMap((c) =>
      c.operators.map((op) => ({
        id: ++id,
        order: d.order,
        classKey: c.key,
        column: 'kept' as const,
        text: op.text,
        latex: op.latex,
        latexDirac: op.latex4,
        hermitian: op.hermitian,
        realParameters: op.realParameters,
      })),
    ),
  )
  return { classes, operators }
}
