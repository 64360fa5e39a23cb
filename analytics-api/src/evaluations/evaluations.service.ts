import type { DataSource } from 'typeorm';
import type { Evaluation } from '@shared/contracts/animals';
import { DEFAULT_EVALUATION_TRAITS, type EvaluationTrait } from '@shared/domain/breed';
import type { Animal } from '../db/entities/animal.entity';
import { Breed } from '../db/entities/breed.entity';
import { Evaluation as EvaluationRow } from '../db/entities/evaluation.entity';
import { AppError, notFound } from '../http/app-error';
import { isDuplicateKey } from '../animals/animal-dto';
import { findAnimal } from '../animals/find-animal';
import { refuseFutureDate } from '../animals/record-dates';
import { toDomainBreed } from '../breeds/to-domain-breed';
import { checkScores } from './check-scores';
import { evaluationDto } from './evaluation-dto';

interface AddEvaluation { evaluatedOn: string; evaluator?: string | null; scores: Record<string, number>; notes?: string | null }

export class EvaluationsService {
  constructor(private readonly db: DataSource) {}

  async list(rabbitryId: number, animalId: number): Promise<{ traits: EvaluationTrait[]; evaluations: Evaluation[] }> {
    const { traits } = await this.traitsOf(rabbitryId, animalId);
    const rows = await this.db.query('SELECT id, evaluated_on, evaluator, scores, notes FROM evaluation WHERE animal_id = ? ORDER BY evaluated_on', [animalId]);
    return { traits, evaluations: rows.map((r: Record<string, unknown>) => evaluationDto(r, traits)) };
  }

  /** Scores are checked against the template of the animal's breed (the default one without a breed). */
  async add(rabbitryId: number, animalId: number, input: AddEvaluation): Promise<Evaluation> {
    const { animal, traits } = await this.traitsOf(rabbitryId, animalId);
    refuseFutureDate(input.evaluatedOn, 'evaluatedOn', 'An evaluation');
    if (animal.birthDate && input.evaluatedOn < animal.birthDate) {
      throw new AppError('validation', `An evaluation cannot come before the birth date (${animal.birthDate})`, 400, { evaluatedOn: 'Before the birth date' });
    }
    const problems = checkScores(input.scores, traits);
    if (Object.keys(problems).length) {
      const details = Object.fromEntries(Object.entries(problems).map(([k, v]) => [`scores.${k}`, v]));
      throw new AppError('validation', Object.values(problems).join('; '), 400, details);
    }
    const repo = this.db.getRepository(EvaluationRow);
    if (await repo.existsBy({ animalId, evaluatedOn: input.evaluatedOn })) throw this.duplicate(input.evaluatedOn);
    try {
      const saved = await repo.save({
        animalId, evaluatedOn: input.evaluatedOn, evaluator: input.evaluator ?? null, scores: input.scores, notes: input.notes ?? null,
      });
      return evaluationDto({ id: saved.id, evaluated_on: saved.evaluatedOn, evaluator: saved.evaluator, scores: saved.scores, notes: saved.notes }, traits);
    } catch (e) {
      if (isDuplicateKey(e)) throw this.duplicate(input.evaluatedOn);
      throw e;
    }
  }

  private duplicate(date: string) {
    return new AppError('conflict', `This animal already has an evaluation on ${date}; delete it first to replace it`, 409, { evaluatedOn: 'Already evaluated on this day' });
  }

  async remove(rabbitryId: number, evaluationId: number): Promise<void> {
    const [row] = await this.db.query(
      'SELECT e.id FROM evaluation e JOIN animal a ON a.id = e.animal_id WHERE e.id = ? AND a.rabbitry_id = ?', [evaluationId, rabbitryId]);
    if (!row) throw notFound('Evaluation');
    await this.db.getRepository(EvaluationRow).delete({ id: evaluationId });
  }

  private async traitsOf(rabbitryId: number, animalId: number): Promise<{ animal: Animal; traits: EvaluationTrait[] }> {
    const animal = await findAnimal(this.db.manager, rabbitryId, animalId);
    const breed = animal.breedId ? await this.db.getRepository(Breed).findOneBy({ id: animal.breedId }) : null;
    return { animal, traits: breed ? toDomainBreed(breed).evaluationTemplate.traits : [...DEFAULT_EVALUATION_TRAITS] };
  }
}
