import type { DataSource } from 'typeorm';
import type { PedigreeTreeNode } from '@shared/contracts/animals';
import { LATEST_WEIGHT_JOIN } from '../weights/latest-weight-join';
import { type AncestorRow, buildPedigreeTree } from './build-pedigree-tree';

/**
 * An animal's pedigree to `generations` generations in one recursive query. Ancestors are
 * followed inside the same rabbitry only, so no other herd's records can come into view.
 * Null when the animal is not in the rabbitry.
 */
export async function loadPedigree(db: DataSource, rabbitryId: number, animalId: number, generations: number): Promise<PedigreeTreeNode | null> {
  const rows: Record<string, unknown>[] = await db.query(
    `WITH RECURSIVE anc AS (
       SELECT id, sire_id, dam_id, 0 AS depth FROM animal WHERE id = ? AND rabbitry_id = ?
       UNION ALL
       SELECT p.id, p.sire_id, p.dam_id, anc.depth + 1 FROM anc
         JOIN animal p ON (p.id = anc.sire_id OR p.id = anc.dam_id) AND p.rabbitry_id = ?
        WHERE anc.depth < ?
     )
     SELECT a.id, a.ear_id, a.name, a.sex, a.variety, a.registration_no, a.grand_champion, a.breeder, a.is_stub,
            a.sire_id, a.dam_id, COALESCE(lw.grams, a.stub_weight_grams) AS weight_grams
       FROM animal a ${LATEST_WEIGHT_JOIN}
      WHERE a.id IN (SELECT id FROM anc)`,
    [animalId, rabbitryId, rabbitryId, generations]);
  if (!rows.some((r) => r.id === animalId)) return null;
  const ancestors: AncestorRow[] = rows.map((r) => ({
    id: r.id as number, earId: r.ear_id as string, name: r.name as string | null, sex: r.sex as 'buck' | 'doe',
    variety: r.variety as string | null, weightGrams: r.weight_grams === null ? null : Number(r.weight_grams),
    registrationNo: r.registration_no as string | null, grandChampion: Boolean(r.grand_champion), breeder: r.breeder as string | null,
    isStub: Boolean(r.is_stub), sireId: r.sire_id as number | null, damId: r.dam_id as number | null,
  }));
  return buildPedigreeTree(ancestors, animalId, generations);
}
