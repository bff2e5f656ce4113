/**
 * The fields of a row of the upright hydrostatic table: names (as in the JSON of every
 * result), units and descriptions, declared once. The CSV headers, the text table, the
 * zod schema and the OpenAPI document are all made from this list.
 */
import { z } from 'zod';

export const HYDROSTATIC_FIELDS = [
  { key: 'draft', unit: 'm', label: 'Draft', description: 'waterline height above baseline' },
  { key: 'volume', unit: 'm3', label: 'Volume', description: 'moulded displaced volume' },
  { key: 'displacement', unit: 't', label: 'Displ.', description: 'density x volume' },
  { key: 'lcb', unit: 'm', label: 'LCB', description: 'x of the centre of buoyancy' },
  { key: 'vcb', unit: 'm', label: 'VCB', description: 'height of the centre of buoyancy above baseline (KB)' },
  { key: 'waterplaneArea', unit: 'm2', label: 'Aw', description: 'waterplane area' },
  { key: 'lcf', unit: 'm', label: 'LCF', description: 'x of the centre of flotation' },
  { key: 'iT', unit: 'm4', label: 'IT', description: 'second moment of the waterplane about the centreline' },
  { key: 'iL', unit: 'm4', label: 'IL', description: 'second moment of the waterplane about the transverse axis through the LCF' },
  { key: 'bmt', unit: 'm', label: 'BMt', description: 'iT / volume' },
  { key: 'bml', unit: 'm', label: 'BMl', description: 'iL / volume' },
  { key: 'kmt', unit: 'm', label: 'KMt', description: 'vcb + bmt' },
  { key: 'kml', unit: 'm', label: 'KMl', description: 'vcb + bml' },
  { key: 'tpc', unit: 't/cm', label: 'TPC', description: 'tonnes per cm immersion' },
  { key: 'mct1cm', unit: 't.m/cm', label: 'MCT1cm', description: 'moment to change trim 1 cm (GML taken as BML)' },
  { key: 'lwl', unit: 'm', label: 'LWL', description: 'length of the waterplane' },
  { key: 'bwl', unit: 'm', label: 'BWL', description: 'greatest breadth of the waterplane' },
  { key: 'am', unit: 'm2', label: 'Am', description: 'immersed sectional area at amidships' },
  { key: 'cb', unit: '-', label: 'Cb', description: 'block coefficient' },
  { key: 'cm', unit: '-', label: 'Cm', description: 'midship-section coefficient' },
  { key: 'cp', unit: '-', label: 'Cp', description: 'prismatic coefficient' },
  { key: 'cwp', unit: '-', label: 'Cwp', description: 'waterplane coefficient' },
  { key: 'wettedSurface', unit: 'm2', label: 'WSA', description: 'wetted surface, immersed transom and end faces included' },
] as const;

export type HydrostaticField = (typeof HYDROSTATIC_FIELDS)[number]['key'];

/** One row of the hydrostatic table: every field a number (NaN where undefined, written as null in JSON). */
export type HydrostaticRow = Record<HydrostaticField, number>;

export const HydrostaticRowSchema = z
  .object(
    // Only a form coefficient may be null (its denominator zero); a draft where the other
    // figures cannot be formed is an error naming it (core/upright/formedRows.ts).
    Object.fromEntries(
      HYDROSTATIC_FIELDS.map((f) => {
        const n = z.number();
        return [f.key, (f.unit === '-' ? n.nullable() : n).describe(`${f.description} (${f.unit})${f.unit === '-' ? '; null where its denominator is zero' : ''}`)];
      }),
    ) as Record<HydrostaticField, z.ZodNullable<z.ZodNumber>>,
  )
  .describe('hydrostatic particulars at one draft, upright and level');
