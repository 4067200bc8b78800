import { STUDY_CSV_COLUMNS } from '@hopwise/common';
import type { SchemaObject } from '@nestjs/swagger';

/** OpenAPI schemas of the study routes (the body is validated by zod in common/src/links). */
const profileSource: SchemaObject = {
  oneOf: [
    {
      type: 'object',
      required: ['kind', 'key'],
      properties: { kind: { enum: ['reference'] }, key: { type: 'string', example: 'quiet-day' } },
    },
    {
      type: 'object',
      required: ['kind', 'profile'],
      properties: {
        kind: { enum: ['inline'] },
        profile: { type: 'object', description: 'ProfileInput with layers or samples' },
      },
    },
    {
      type: 'object',
      required: ['kind', 'id'],
      properties: { kind: { enum: ['library'] }, id: { type: 'integer' } },
    },
  ],
};

export const CREATE_STUDY_SCHEMA: SchemaObject = {
  type: 'object',
  required: ['linkId', 'atUtc', 'profileSource', 'frequenciesMHz'],
  properties: {
    linkId: { type: 'integer', example: 1 },
    atUtc: { type: 'string', format: 'date-time', example: '2026-03-18T13:00:00Z' },
    name: { type: 'string', maxLength: 80 },
    profileSource,
    frequenciesMHz: {
      type: 'array',
      minItems: 1,
      maxItems: 200,
      items: { type: 'number', minimum: 1, maximum: 50 },
      example: [7.1, 10.1, 14.2],
    },
    mode: { enum: ['oblique'], default: 'oblique' },
  },
};

export const STUDY_SCHEMA: SchemaObject = {
  type: 'object',
  properties: {
    id: { type: 'integer' },
    ownerId: { type: 'integer' },
    linkId: { type: 'integer' },
    name: { type: 'string', nullable: true },
    atUtc: { type: 'string', format: 'date-time' },
    profileSource,
    profile: { type: 'object', description: 'The ProfileData used ({ layers } or { samples })' },
    frequenciesMHz: { type: 'array', items: { type: 'number' } },
    result: {
      type: 'object',
      properties: {
        groundRangeKm: { type: 'number' },
        perFrequency: {
          type: 'array',
          items: {
            type: 'object',
            description:
              '{ frequencyMHz } plus the oblique response (modes with rayPath, mufMHz, multipathSpreadMs)',
          },
        },
      },
    },
    createdAt: { type: 'string', format: 'date-time' },
    updatedAt: { type: 'string', format: 'date-time' },
  },
};

export const STUDY_LIST_SCHEMA: SchemaObject = {
  type: 'object',
  properties: { items: { type: 'array', items: STUDY_SCHEMA }, total: { type: 'integer' } },
};

export const STUDY_CSV_DESCRIPTION = `CSV (RFC 4180), one row per frequency and mode: ${STUDY_CSV_COLUMNS.join(',')}`;
