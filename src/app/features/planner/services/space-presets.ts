import { Injectable } from '@angular/core';
import type { AgeGroup, Space } from '../../../../../shared/types';

export interface SpacePreset {
  label: string;
  space: Space;
}

/** Quick picks for the space: a half or a third of the pitch the age group plays on. */
@Injectable({ providedIn: 'root' })
export class SpacePresets {
  async forAgeGroup(ageGroup: AgeGroup): Promise<SpacePreset[]> {
    void ageGroup;
    return [];
  }
}
