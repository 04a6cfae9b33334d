import { Pipe, type PipeTransform } from '@angular/core';
import { ageGroupLabel, type AgeGroup } from '../../../../shared/types';

/** `{{ team.ageGroup | ageGroupLabel }}`: "U10" as it is, "adult" as "Adult" (shared/types/squad-words.ts). */
@Pipe({ name: 'ageGroupLabel' })
export class AgeGroupLabelPipe implements PipeTransform {
  transform(ageGroup: AgeGroup): string {
    return ageGroupLabel(ageGroup);
  }
}
