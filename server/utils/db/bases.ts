import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import { liveTheories } from './live'
import { annotationsOfTheory } from './annotations'
import { tagsOfOperators } from './tags'

/** A basis whose theory and group are not deleted (nor the basis itself, unless `deleted`: for undo). */
export async function basisOr404(id: number, opts: { deleted?: boolean } = {}) {
  const q = liveTheories(useDb()('bases as b').join('theories as t', 't.id', 'b.theory_id')).where('b.id', id)
  if (!opts.deleted) q.whereNull('b.deleted_at')
  const row = await q.first('b.*', 't.group_id', 't.name as theory_name', 't.definition as theory_definition')
  if (!row) fail(404, `No basis with id ${id}`)
  return row
}

export async function operatorOr404(id: number) {
  const row = await liveTheories(useDb()('operators as o').join('bases as b', 'b.id', 'o.basis_id').join('theories as t', 't.id', 'b.theory_id'))
    .where('o.id', id)
    .whereNull('b.deleted_at')
    .first('o.*', 't.group_id', 'b.theory_id')
  if (!row) fail(404, `No operator with id ${id}`)
  return row
}

/** Everything the board shows: classes, operators (both columns), tags and notes. */
export async function boardData(basisId: number) {
  const db = useDb()
  const basis = await basisOr404(basisId)
  // Only the parts of `structure` the board shows (it also holds spinor and gauge index data).
  const operators = await db('operators')
    .where({ basis_id: basisId })
    .orderBy(['order', 'column', 'position'])
    .select(
      'id',
      'order',
      'class_key as classKey',
      'column',
      'position',
      'latex',
      'latex_dirac as latexDirac',
      'hermitian',
      'real_parameters as realParameters',
      'text',
      'version',
      db.raw(`jsonb_build_object('fields', structure->'fields', 'flavorComponents', structure->'flavorComponents', 'cp', structure->'cp', 'parity', structure->'parity',
        'relations', structure->'relations', 'publishedRewrite', structure->'publishedRewrite', 'gaugeEomNote', structure->'gaugeEomNote',
        'source', structure->'source', 'antiHermitian', structure->'antiHermitian') as structure`),
    )
  const ids = operators.map((o) => o.id)
  const tags = ids.length ? await tagsOfOperators(ids) : []
  const notes = await annotationsOfTheory(basis.theory_id)
  const thresholdTags = await db('threshold_tags').where({ theory_id: basis.theory_id }).select('id', 'term', 'field', 'text', 'details')
  const frozen = await theoryOfBasis(basisId)
  return {
    basis: {
      id: basis.id,
      theoryId: basis.theory_id,
      theoryName: basis.theory_name,
      theoryVersion: basis.theory_version,
      countingRule: basis.counting_rule as string,
      maxOrder: basis.max_order,
      classes: basis.classes,
      note: basis.note as string,
      createdAt: basis.created_at,
      // The fields as the basis's theory file wrote them (name and display form), so labels print them as papers do.
      fields: ((frozen?.fields ?? []) as { name: string; display?: string }[]).map((f) => ({ name: f.name, display: f.display })),
    },
    operators: operators.map(({ structure, ...o }) => ({
      ...o,
      fields: structure?.fields ?? [],
      flavorComponents: structure?.flavorComponents ?? 1,
      details: {
        antiHermitian: !!structure?.antiHermitian,
        cp: structure?.cp ?? null,
        parity: structure?.parity ?? null,
        relations: structure?.relations ?? [],
        publishedRewrite: structure?.publishedRewrite ?? null,
        gaugeEomNote: structure?.gaugeEomNote ?? null,
        source: structure?.source ?? null,
      },
    })),
    tags,
    notes,
    thresholdTags,
    groupId: basis.group_id as number,
  }
}

/** The newest basis of a theory that is not deleted (what a share link shows). */
export function latestBasisOf(theoryId: number) {
  return useDb()('bases').where({ theory_id: theoryId }).whereNull('deleted_at').orderBy('id', 'desc').first('id')
}

/** The frozen theory file a basis was computed from (the theory may have been edited since). */
export async function theoryOfBasis(basisId: number): Promise<Record<string, any>> {
  const row = await useDb()('bases as b').leftJoin('runs as r', 'r.id', 'b.run_id').join('theories as t', 't.id', 'b.theory_id').where('b.id', basisId).first('r.params', 't.definition')
  return row?.params?.theory ?? row?.definition
}
