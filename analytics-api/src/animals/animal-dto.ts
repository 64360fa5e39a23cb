import type { Animal as AnimalDto, AnimalLitter, AnimalSummary } from '@shared/contracts/animals';
import type { Animal } from '../db/entities/animal.entity';

export function toSummary(a: Animal): AnimalSummary {
  return { id: a.id, earId: a.earId, name: a.name, sex: a.sex, variety: a.variety, birthDate: a.birthDate, status: a.status, isStub: a.isStub };
}

export function toAnimalDto(a: Animal, breedName: string | null): AnimalDto {
  return {
    ...toSummary(a), rabbitryId: a.rabbitryId, breedId: a.breedId, breed: breedName, sireId: a.sireId, damId: a.damId,
    litterId: a.litterId, line: a.line, registrationNo: a.registrationNo, grandChampion: a.grandChampion, breeder: a.breeder,
    stubWeightGrams: a.stubWeightGrams, hasPhoto: a.photoPath !== null, notes: a.notes, keeperDecision: a.keeperDecision,
  };
}

/** A litter row of the animal profile's query (with its mate's ear ID and name, and the kits recorded). */
export function toAnimalLitter(r: Record<string, unknown>): AnimalLitter {
  return {
    id: r.id as number, code: r.code as string,
    mate: r.mate_id === null ? null : { id: r.mate_id as number, earId: r.mate_ear_id as string, name: r.mate_name as string | null },
    bredOn: r.bred_on as string | null, kindledOn: r.kindled_on as string | null, bornAlive: r.born_alive as number | null,
    bornDead: r.born_dead as number | null, weaned: r.weaned as number | null, kitsRecorded: Number(r.kits),
  };
}

/** MariaDB's duplicate-key error, as TypeORM passes it on. */
export function isDuplicateKey(e: unknown): boolean {
  const err = e as { code?: string; driverError?: { code?: string } };
  return err?.code === 'ER_DUP_ENTRY' || err?.driverError?.code === 'ER_DUP_ENTRY';
}
