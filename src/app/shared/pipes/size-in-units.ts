import { Pipe, type PipeTransform } from '@angular/core';
import { formatSize, type DistanceUnit } from '../../../../shared/units';

/**
 * `{{ station.area | sizeInUnits: units.distance() }}`: an area's width by its length in whole
 * numbers of the reader's unit ("40 × 60 yd"), written by shared/units.
 */
@Pipe({ name: 'sizeInUnits' })
export class SizeInUnitsPipe implements PipeTransform {
  transform(size: { width: number; length: number }, unit: DistanceUnit, by = ' × '): string {
    return formatSize(unit, size, by);
  }
}
