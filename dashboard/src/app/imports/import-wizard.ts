import { ChangeDetectionStrategy, ChangeDetectorRef, Component, DestroyRef, ViewEncapsulation, computed, inject, input, output, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatStepper, MatStepperModule } from '@angular/material/stepper';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { Subscription, exhaustMap, startWith, takeWhile, timer } from 'rxjs';
import type { ImportJob } from '@shared/contracts/imports';
import type { ImportKindKey } from '@shared/imports/import-kinds';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { betterKind, cleanMapping, fieldLabel, mappingFields, mappingProblems, unusedHeaders } from './column-mapping';
import { DELIMITER_NAMES, previewCsv, readFileStart, type CsvPreview } from './csv-preview';
import { ImportsApi, type ImportScope } from './imports-api';
import { isRunning, KINDS_FOR, kindLabel, progressOf, summaryCounts } from './import-words';

/** Polling interval for a running check or commit: often enough to show progress, rare enough to cost nothing. */
const POLL_MS = 500;

/** The import wizard: file → upload → columns → check → import, for one scope (herd or club). */
@Component({
  selector: 'kl-import-wizard',
  templateUrl: './import-wizard.html',
  styleUrl: './import-wizard.scss',
  // The stepper's own spacing is tightened for phones; every rule is scoped under kl-import-wizard.
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatProgressBarModule,
    MatRadioModule,
    MatSelectModule,
    MatStepperModule,
    MatTableModule,
  ],
})
export class ImportWizard {
  private readonly api = inject(ImportsApi);
  private readonly cdr = inject(ChangeDetectorRef);
  private readonly destroyRef = inject(DestroyRef);
  private readonly stepper = viewChild.required(MatStepper);
  private readonly user = inject(Session).user;

  readonly scope = input.required<ImportScope>();
  readonly vertical = input(false);
  /** A job was checked or imported: the history below has changed. */
  readonly changed = output<void>();

  protected readonly kinds = computed(() => KINDS_FOR[this.scope().kind].map((key) => ({ key, label: kindLabel(key), fields: mappingFields(key) })));
  protected readonly kind = signal<ImportKindKey | null>(null);
  protected readonly chosenKind = computed(() => this.kind() ?? this.kinds()[0]!.key);
  protected readonly file = signal<File | null>(null);
  protected readonly preview = signal<CsvPreview | null>(null);
  protected readonly delimiterNames = DELIMITER_NAMES;
  /** A kind the chosen file fits better than the one picked, to offer before uploading. */
  protected readonly betterKind = computed(() => {
    const p = this.preview();
    return p && !p.looksBinary ? betterKind(p.headers, this.chosenKind(), this.kinds().map((k) => k.key)) : null;
  });

  protected readonly uploadProgress = signal<number | null>(null);
  protected readonly uploadFailure = signal<string | null>(null);
  protected readonly job = signal<ImportJob | null>(null);
  protected readonly requestFailure = signal<string | null>(null);

  /** Evaluations: the trait columns of the herd's breed templates, known once the file is uploaded. */
  private readonly traits = computed(() => this.job()?.evaluationTraits ?? null);
  protected readonly fields = computed(() => mappingFields(this.chosenKind(), this.traits()));
  protected mapping = new FormGroup<Record<string, FormControl<string>>>({});
  private readonly mappingVersion = signal(0);
  protected readonly mappingValue = computed(() => {
    this.mappingVersion();
    return cleanMapping(this.mapping.getRawValue());
  });
  protected readonly problems = computed(() => mappingProblems(this.chosenKind(), this.mappingValue(), this.traits()));
  protected readonly unused = computed(() => unusedHeaders(this.job()?.headers ?? [], this.mappingValue()));
  protected readonly options = new FormGroup({
    dateOrder: new FormControl<'iso' | 'mdy'>(this.user()?.dateOrder ?? 'iso', { nonNullable: true }),
    unknownEarIds: new FormControl<'create-stubs' | 'skip'>('skip', { nonNullable: true }),
  });
  protected readonly skipErrors = new FormControl(false, { nonNullable: true });
  private readonly skipping = toSignal(this.skipErrors.valueChanges.pipe(startWith(false)), { initialValue: false });

  protected readonly status = computed(() => this.job()?.status ?? null);
  protected readonly progress = computed(() => {
    const j = this.job();
    return j && isRunning(j) ? progressOf(j) : null;
  });
  protected readonly summary = computed(() => {
    const j = this.job();
    return j && j.status !== 'checking' ? j.summary : null;
  });
  protected readonly counts = computed(() => {
    const s = this.summary();
    return s ? summaryCounts(s) : [];
  });
  protected readonly committed = computed(() => this.status() === 'done' && this.phase() === 'commit');
  protected readonly phase = signal<'check' | 'commit'>('check');
  protected readonly blockedByErrors = computed(() => (this.summary()?.errorRows ?? 0) > 0 && !this.skipping());
  protected readonly problemColumns = ['row', 'field', 'severity', 'message'];
  protected readonly problemsUrl = computed(() => {
    const j = this.job();
    return j ? this.api.problemsUrl(this.scope(), j.id) : '';
  });

  private polling: Subscription | null = null;

  protected label(key: string): string {
    return fieldLabel(this.chosenKind(), key, this.traits());
  }

  protected sample(header: string | undefined): string {
    const j = this.job();
    if (!j || !header) return '';
    const i = j.headers.indexOf(header);
    const values = j.sampleRows.map((r) => r[i]).filter((v) => v !== undefined && v.trim() !== '').slice(0, 2);
    return values.length ? `e.g. ${values.join(', ')}` : 'empty in the first rows';
  }

  protected chooseKind(kind: ImportKindKey): void {
    this.kind.set(kind);
    this.forgetJob();
  }

  protected async chooseFile(event: Event): Promise<void> {
    const chosen = (event.target as HTMLInputElement).files?.[0] ?? null;
    this.forgetJob();
    this.file.set(chosen);
    this.preview.set(null);
    if (!chosen) return;
    const { text, truncated } = await readFileStart(chosen);
    this.preview.set(previewCsv(text, 5, truncated));
  }

  protected upload(): void {
    const file = this.file();
    if (!file) return;
    this.forgetJob();
    this.uploadProgress.set(0);
    this.advance();
    this.api
      .upload(this.scope(), this.chosenKind(), file)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (event) => {
          if ('progress' in event) this.uploadProgress.set(event.progress);
          else this.received(event.job);
        },
        error: (err: unknown) => {
          this.uploadProgress.set(null);
          this.uploadFailure.set(describeFailure(err).message);
        },
      });
  }

  protected toColumns(): void {
    this.advance();
  }

  protected check(): void {
    const j = this.job();
    if (!j || this.problems().length) return;
    this.requestFailure.set(null);
    this.phase.set('check');
    const { dateOrder, unknownEarIds } = this.options.getRawValue();
    this.api.check(this.scope(), j.id, { mapping: this.mappingValue(), dateOrder, unknownEarIds }).subscribe({
      next: (started) => {
        this.job.set(started);
        this.advance();
        this.follow(started.id);
      },
      error: (err: unknown) => this.requestFailure.set(describeFailure(err).message),
    });
  }

  protected toCommit(): void {
    this.advance();
  }

  protected commit(): void {
    const j = this.job();
    if (!j || this.blockedByErrors()) return;
    this.requestFailure.set(null);
    this.phase.set('commit');
    this.api.commit(this.scope(), j.id, this.skipErrors.value).subscribe({
      next: (started) => {
        this.job.set(started);
        this.follow(started.id);
      },
      error: (err: unknown) => this.requestFailure.set(describeFailure(err).message),
    });
  }

  protected startOver(): void {
    this.forgetJob();
    this.file.set(null);
    this.preview.set(null);
    this.stepper().reset();
  }

  protected back(): void {
    this.stepper().previous();
  }

  private received(job: ImportJob): void {
    this.uploadProgress.set(null);
    this.job.set(job);
    const controls: Record<string, FormControl<string>> = {};
    for (const f of mappingFields(job.kind, job.evaluationTraits)) controls[f.key] = new FormControl(job.suggestedMapping[f.key] ?? '', { nonNullable: true });
    this.mapping = new FormGroup(controls);
    this.mapping.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => this.mappingVersion.update((v) => v + 1));
    this.mappingVersion.update((v) => v + 1);
  }

  /** Follows a running job until it has stopped, showing each reported row count. */
  private follow(jobId: number): void {
    this.polling?.unsubscribe();
    this.polling = timer(POLL_MS, POLL_MS)
      .pipe(
        exhaustMap(() => this.api.get(this.scope(), jobId)),
        takeWhile((j) => isRunning(j), true),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe({
        next: (j) => {
          this.job.set(j);
          if (!isRunning(j)) this.changed.emit();
        },
        error: (err: unknown) => this.requestFailure.set(describeFailure(err).message),
      });
  }

  private forgetJob(): void {
    this.polling?.unsubscribe();
    this.job.set(null);
    this.uploadFailure.set(null);
    this.uploadProgress.set(null);
    this.requestFailure.set(null);
    this.skipErrors.setValue(false);
    this.phase.set('check');
  }

  /** The steps' `completed` inputs follow the signals on the next check; run it now so a linear stepper may move on. */
  private advance(): void {
    this.cdr.detectChanges();
    this.stepper().next();
  }

  protected readonly kindLabel = kindLabel;
}
