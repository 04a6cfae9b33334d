import { Injectable } from '@angular/core';
import type { AgeGroup } from '../../../../../shared/types';
import { spacePresetsFor, type SpacePreset } from '../../../../../shared/types/plan-pitch';

export type { SpacePreset };

/** Quick picks for the space: the age group's format pitch, its half and its third. */
@Injectable({ providedIn: 'root' })
export class SpacePresets {
  async forAgeGroup(ageGroup: AgeGroup): Promise<SpacePreset[]> {
    return spacePresetsFor(ageGroup);
  }
}
