import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NgTemplateOutlet } from '@angular/common';
import { RouterLink } from '@angular/router';
import { map } from 'rxjs';
import type { PedigreeTreeNode } from '@shared/contracts/animals';
import { formatWeight, type UnitSetting } from '@shared/units/weight';
import { pedigreeSlots, type PedigreeSlot } from './pedigree-slots';

const GENERATION_NAMES = ['Parents', 'Grandparents', 'Great-grandparents', 'Great-great-grandparents', '5th generation', '6th generation'];

/**
 * Four generations in columns, as on a paper pedigree; on a phone, one list per generation.
 * Each ancestor opens its own page; outside parents (stubs) are marked.
 */
@Component({
  selector: 'kl-pedigree-tree',
  template: `
    <ng-template #facts let-a>
      <span class="line">
        <a class="ear-id" [routerLink]="['/r', rabbitryId(), 'animals', a.id]">{{ a.earId }}</a>
        @if (a.name) {
          <span class="name"> {{ a.name }}</span>
        }
        @if (a.grandChampion) {&ngsp;<span class="kl-role gc" title="Grand champion">GC</span>}
      </span>
      <span class="facts">{{ a.variety ?? 'variety not recorded' }}{{ a.weightGrams ? ' · ' + weight(a.weightGrams) : '' }}</span>
      @if (a.isStub) {
        <span class="outside">Outside parent{{ a.breeder ? ' · bred by ' + a.breeder : '' }}</span>
      }
    </ng-template>

    @if (isPhone()) {
      @for (g of generations(); track g.name) {
        <h3 class="generation">{{ g.name }}</h3>
        <ul class="list">
          @for (slot of g.slots; track slot.relation) {
            <li class="slot" [class.empty]="!slot.animal" [class.stub]="slot.animal?.isStub">
              <span class="relation">{{ slot.relation }}</span>
              @if (slot.animal; as a) {
                <ng-container *ngTemplateOutlet="facts; context: { $implicit: a }" />
              } @else {
                <span class="kl-muted">Not recorded</span>
              }
            </li>
          }
        </ul>
      }
    } @else {
      <div class="scroll" tabindex="0" role="region" aria-label="Pedigree">
        <ol class="tree" [style.grid-template-rows]="'repeat(' + rows() + ', minmax(2.75rem, auto))'">
          @for (slot of slots(); track slot.relation) {
            <li
              class="slot"
              [class.empty]="!slot.animal"
              [class.stub]="slot.animal?.isStub"
              [style.grid-column]="slot.generation"
              [style.grid-row]="slot.rowStart + ' / span ' + slot.rowSpan"
            >
              <!-- The column says the generation; from the great-grandparents on, the place is told to screen readers only. -->
              <span class="relation" [class.kl-visually-hidden]="slot.generation > 2">{{ slot.relation }}</span>
              @if (slot.animal; as a) {
                <ng-container *ngTemplateOutlet="facts; context: { $implicit: a }" />
              } @else {
                <span class="kl-muted">Not recorded</span>
              }
            </li>
          }
        </ol>
      </div>
    }
  `,
  styleUrl: './pedigree-tree.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, NgTemplateOutlet],
})
export class PedigreeTree {
  readonly tree = input.required<PedigreeTreeNode>();
  readonly generationCount = input(4, { alias: 'generations' });
  readonly rabbitryId = input.required<string>();
  readonly unit = input.required<UnitSetting>();

  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe('(max-width: 600px)').pipe(map((s) => s.matches)), {
    initialValue: false,
  });
  protected readonly slots = computed(() => pedigreeSlots(this.tree(), this.generationCount()));
  protected readonly rows = computed(() => 2 ** this.generationCount());
  protected readonly generations = computed(() => {
    const byGeneration = new Map<number, PedigreeSlot[]>();
    for (const s of this.slots()) byGeneration.set(s.generation, [...(byGeneration.get(s.generation) ?? []), s]);
    return [...byGeneration].map(([g, slots]) => ({ name: GENERATION_NAMES[g - 1]!, slots }));
  });

  protected weight(grams: number): string {
    return formatWeight(grams, this.unit());
  }
}
