/**
 * The types that come from the zod schemas are pinned here, so a change to a schema
 * that changes what callers receive fails a test instead of slipping through
 * (the schema is the one source of validation, types and the OpenAPI document).
 */
import { describe, expect, expectTypeOf, test } from 'vitest';
import { HullModelSchema, type HullModel, type Point } from '../../core/hull/hullModel.js';
import { HYDROSTATIC_FIELDS, HydrostaticRowSchema, type HydrostaticField, type HydrostaticRow } from '../../core/upright/hydrostaticFields.js';

describe('types from the schemas', () => {
  test('a hull model is a name, optional perpendiculars and waterlines, and stations of points', () => {
    expectTypeOf<HullModel>().toEqualTypeOf<{
      name: string;
      ap?: number | undefined;
      fp?: number | undefined;
      waterlines?: number[] | undefined;
      stations: { x: number; points: { y: number; z: number; knuckle: boolean }[] }[];
    }>();
    expectTypeOf<Point["knuckle"]>().toEqualTypeOf<boolean>();
  });

  test('a parsed model gets the defaults the schema declares', () => {
    const hull = HullModelSchema.parse({
      stations: [0, 1, 2].map((x) => ({ x, points: [{ y: 1, z: 0 }, { y: 1, z: 1 }] })),
    });
    expect(hull.name).toBe('unnamed hull');
    expect(hull.stations[0]!.points[0]!.knuckle).toBe(false);
  });

  test('a hydrostatic row has exactly the fields of the conventions, all numbers', () => {
    // Field list of the project's conventions ("Hydrostatic particulars"), written out here.
    const conventions = [
      'draft', 'volume', 'displacement', 'lcb', 'vcb', 'waterplaneArea', 'lcf', 'iT', 'iL', 'bmt', 'bml', 'kmt', 'kml',
      'tpc', 'mct1cm', 'lwl', 'bwl', 'am', 'cb', 'cm', 'cp', 'cwp', 'wettedSurface',
    ] as const;
    expectTypeOf<HydrostaticField>().toEqualTypeOf<(typeof conventions)[number]>();
    expectTypeOf<HydrostaticRow[HydrostaticField]>().toEqualTypeOf<number>();
    expect(HYDROSTATIC_FIELDS.map((f) => f.key)).toEqual([...conventions]);
    expect(Object.keys(HydrostaticRowSchema.shape)).toEqual([...conventions]);
  });
});
