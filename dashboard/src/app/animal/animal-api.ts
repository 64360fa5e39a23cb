import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import {
  AddEvaluationRequest,
  AddWeightRequest,
  Animal,
  AnimalProfile,
  ChangeStatusRequest,
  Evaluation,
  type KeeperDecision,
  PedigreeResponse,
  StatusChange,
  Weight,
} from '@shared/contracts/animals';
import { Note } from '@shared/contracts/notes';
import { evaluationTemplateSchema } from '@shared/domain/breed';
import { animalsUrl } from '../herd/herd-api';

const EvaluationList = z.object({ traits: evaluationTemplateSchema.shape.traits, evaluations: z.array(Evaluation) });
const StatusHistory = z.object({ statusHistory: z.array(StatusChange) });
export type NewWeight = z.input<typeof AddWeightRequest>;
export type NewEvaluation = z.input<typeof AddEvaluationRequest>;
export type NewStatus = z.input<typeof ChangeStatusRequest>;
export type Paper = 'letter' | 'a4';

const rabbitryUrl = (rabbitryId: string) => `/api/rabbitries/${encodeURIComponent(rabbitryId)}`;
const animalUrl = (rabbitryId: string, animalId: string | number) => `${animalsUrl(rabbitryId)}/${encodeURIComponent(String(animalId))}`;

/** Everything the animal screen reads and writes about one animal. */
@Injectable({ providedIn: 'root' })
export class AnimalApi {
  private readonly http = inject(HttpClient);

  profile(rabbitryId: () => string, animalId: () => string) {
    return httpResource(() => animalUrl(rabbitryId(), animalId()), { parse: (body) => AnimalProfile.parse(body) });
  }

  pedigree(rabbitryId: () => string, animalId: () => string, generations = 4) {
    return httpResource(() => ({ url: `${animalUrl(rabbitryId(), animalId())}/pedigree`, params: { generations } }), {
      parse: (body) => PedigreeResponse.parse(body),
    });
  }

  /** The breed's scoring template (the default one without a breed) with the animal's evaluations. */
  evaluations(rabbitryId: () => string, animalId: () => string) {
    return httpResource(() => `${animalUrl(rabbitryId(), animalId())}/evaluations`, { parse: (body) => EvaluationList.parse(body) });
  }

  addWeight(rabbitryId: string, animalId: number, weight: NewWeight): Observable<Weight> {
    return this.http.post(`${animalUrl(rabbitryId, animalId)}/weights`, weight).pipe(map((body) => Weight.parse(body)));
  }

  removeWeight(rabbitryId: string, weightId: number): Observable<void> {
    return this.http.delete<void>(`${rabbitryUrl(rabbitryId)}/weights/${weightId}`);
  }

  addEvaluation(rabbitryId: string, animalId: number, evaluation: NewEvaluation): Observable<Evaluation> {
    return this.http.post(`${animalUrl(rabbitryId, animalId)}/evaluations`, evaluation).pipe(map((body) => Evaluation.parse(body)));
  }

  changeStatus(rabbitryId: string, animalId: number, change: NewStatus) {
    return this.http.post(`${animalUrl(rabbitryId, animalId)}/status`, change).pipe(map((body) => StatusHistory.parse(body).statusHistory));
  }

  setKeeperDecision(rabbitryId: string, animalId: number, decision: KeeperDecision): Observable<Animal> {
    return this.http.patch(`${animalUrl(rabbitryId, animalId)}/keeper-decision`, { decision }).pipe(map((body) => Animal.parse(body)));
  }

  addNote(rabbitryId: string, animalId: number, body: string): Observable<Note> {
    return this.http.post(`${rabbitryUrl(rabbitryId)}/notes`, { body, animalId }).pipe(map((answer) => Note.parse(answer)));
  }

  uploadPhoto(rabbitryId: string, animalId: number, file: File): Observable<unknown> {
    const form = new FormData();
    form.append('photo', file);
    return this.http.post(`${animalUrl(rabbitryId, animalId)}/photo`, form);
  }

  photoUrl(rabbitryId: string, animalId: number): string {
    return `${animalUrl(rabbitryId, animalId)}/photo`;
  }

  certificateUrl(rabbitryId: string, animalId: number, paper: Paper): string {
    return `${animalUrl(rabbitryId, animalId)}/pedigree.pdf?paper=${paper}`;
  }
}
