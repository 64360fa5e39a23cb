import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { ClubRole, RabbitryRole, ROLE_DESCRIPTIONS } from '@shared/contracts/roles';

/** "What each role may do", worded once in shared/contracts/roles.ts. */
@Component({
  selector: 'kl-role-guide',
  template: `
    <section class="kl-section" aria-labelledby="role-guide-title">
      <h2 id="role-guide-title">What each role may do</h2>
      <dl class="kl-role-guide">
        @for (entry of entries(); track entry.role) {
          <div>
            <dt class="kl-role">{{ entry.role }}</dt>
            <dd>{{ entry.description }}</dd>
          </div>
        }
      </dl>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoleGuide {
  readonly roles = input.required<readonly (RabbitryRole | ClubRole)[]>();
  protected readonly entries = computed(() => this.roles().map((role) => ({ role, description: ROLE_DESCRIPTIONS[role] })));
}
