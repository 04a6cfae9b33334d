import { Injectable } from '@angular/core';
import type { AgeGroup } from '../../../../../shared/types';
import type { DistanceUnit } from '../../../../../shared/units';
import { spacePresetsFor, type SpacePreset } from '../../../../../shared/pitch/pitch-standards';

export type { SpacePreset };

/** Quick picks for the space: the age group's format pitch, its half and its third, in `unit`. */
@Injectable({ providedIn: 'root' })
export class SpacePresets {
  async forAgeGroup(ageGroup: AgeGroup, unit: DistanceUnit): Promise<SpacePreset[]> {
    return spacePresetsFor(ageGroup, unit);
  }
}
