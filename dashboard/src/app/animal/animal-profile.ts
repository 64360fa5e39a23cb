import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleChange, MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { Animal, AnimalProfile as Profile, KeeperDecision } from '@shared/contracts/animals';
import { AGE_CLASS_LABELS, ANIMAL_STATUS_LABELS, SEX_LABELS } from '@shared/domain/terms';
import { BreedsApi } from '../breeds/breeds-api';
import { AnimalForm, type AnimalFormData } from '../herd/animal-form';
import { describeAge, localToday } from '../records/describe-age';
import { editsRecords, rabbitryRoleOf } from '../records/records-access';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';
import { AnimalApi, type Paper } from './animal-api';
import { EvaluationsPanel } from './evaluations-panel';
import { litterWords } from './litter-words';
import { NotesPanel } from './notes-panel';
import { PedigreeTree } from './pedigree-tree';
import { ShowRecordPanel } from './show-record-panel';
import { StatusPanel } from './status-panel';
import { WeightsPanel } from './weights-panel';

@Component({
  selector: 'kl-animal-profile',
  templateUrl: './animal-profile.html',
  styleUrl: './animal-profile.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatProgressBarModule,
    MatSelectModule,
    LoadError,
    PedigreeTree,
    WeightsPanel,
    EvaluationsPanel,
    ShowRecordPanel,
    StatusPanel,
    NotesPanel,
  ],
})
export class AnimalProfile {
  private readonly api = inject(AnimalApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly rabbitryId = input.required<string>();
  readonly animalId = input.required<string>();

  protected readonly profile = this.api.profile(this.rabbitryId, this.animalId);
  protected readonly pedigree = this.api.pedigree(this.rabbitryId, this.animalId);
  protected readonly evaluations = this.api.evaluations(this.rabbitryId, this.animalId);
  protected readonly breeds = inject(BreedsApi).list();

  protected readonly canEdit = computed(() => editsRecords(rabbitryRoleOf(this.session.user(), this.rabbitryId())));
  protected readonly unit = computed(() => this.session.user()?.weightUnit ?? 'lb-oz');
  protected readonly data = computed<Profile | undefined>(() => (this.profile.hasValue() ? this.profile.value() : undefined));
  protected readonly animal = computed<Animal | undefined>(() => this.data()?.animal);

  protected readonly facts = computed(() => {
    const p = this.data();
    if (!p) return [];
    const a = p.animal;
    const age = describeAge(a.birthDate, localToday());
    return [
      SEX_LABELS[a.sex],
      a.breed,
      a.variety,
      a.birthDate ? `born ${a.birthDate}${age ? ` (${age})` : ''}` : 'birth date not recorded',
      p.ageClass ? `${AGE_CLASS_LABELS[p.ageClass].toLowerCase()} today` : null,
      a.line ? `line ${a.line}` : null,
      a.registrationNo ? `reg. no. ${a.registrationNo}` : null,
    ].filter((f): f is string => !!f);
  });
  protected readonly statusLabel = computed(() => {
    const a = this.animal();
    if (!a) return '';
    return a.isStub ? 'Outside parent' : ANIMAL_STATUS_LABELS[a.status];
  });
  protected readonly seniorLimits = computed(() => {
    const a = this.animal();
    const breed = a && this.breeds.hasValue() ? this.breeds.value().find((b) => b.id === a.breedId) : undefined;
    return breed && a ? breed.weightLimits[a.sex].senior : null;
  });
  protected readonly myLitters = computed(() => {
    const p = this.data();
    return p ? [...p.litters.asSire, ...p.litters.asDam].map((l) => ({ ...l, words: litterWords(l) })) : [];
  });

  protected readonly paper = signal<Paper>('letter');
  protected readonly certificateUrl = computed(() => {
    const a = this.animal();
    return a ? this.api.certificateUrl(this.rabbitryId(), a.id, this.paper()) : '';
  });
  private readonly photoVersion = signal(0);
  protected readonly photoUrl = computed(() => {
    const a = this.animal();
    return a?.hasPhoto ? `${this.api.photoUrl(this.rabbitryId(), a.id)}?v=${this.photoVersion()}` : null;
  });
  protected readonly uploading = signal(false);
  protected readonly decisions: { value: KeeperDecision; label: string }[] = [
    { value: 'keep', label: 'Keep' },
    { value: 'sell', label: 'Sell' },
    { value: 'undecided', label: 'Undecided' },
  ];

  protected reload(): void {
    this.profile.reload();
    this.evaluations.reload();
    this.pedigree.reload();
  }

  protected edit(): void {
    const p = this.data();
    if (!p) return;
    const data: AnimalFormData = {
      rabbitryId: this.rabbitryId(),
      animal: { ...p.animal, sireEarId: p.sire?.earId ?? null, damEarId: p.dam?.earId ?? null },
    };
    this.dialog
      .open<AnimalForm, AnimalFormData, Animal>(AnimalForm, { data, width: '44rem', maxWidth: '100vw' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.snackBar.open(`${saved.earId} saved.`, 'OK', { duration: 4000 });
        this.reload();
      });
  }

  protected decide(change: MatButtonToggleChange): void {
    const a = this.animal();
    if (!a) return;
    this.api.setKeeperDecision(this.rabbitryId(), a.id, change.value as KeeperDecision).subscribe({
      next: (saved) => this.profile.update((p) => (p ? { ...p, animal: saved } : p)),
      error: (err: unknown) => {
        this.snackBar.open(describeFailure(err).message, 'Dismiss');
        this.profile.reload();
      },
    });
  }

  protected uploadPhoto(event: Event): void {
    const field = event.target as HTMLInputElement;
    const file = field.files?.[0];
    const a = this.animal();
    if (!file || !a) return;
    this.uploading.set(true);
    this.api.uploadPhoto(this.rabbitryId(), a.id, file).subscribe({
      next: () => {
        this.uploading.set(false);
        field.value = '';
        this.photoVersion.update((v) => v + 1);
        this.profile.update((p) => (p ? { ...p, animal: { ...p.animal, hasPhoto: true } } : p));
      },
      error: (err: unknown) => {
        this.uploading.set(false);
        field.value = '';
        this.snackBar.open(describeFailure(err).message, 'Dismiss');
      },
    });
  }
}
