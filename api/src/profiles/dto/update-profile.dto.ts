import { PartialType } from '@nestjs/swagger';
import { CreateProfileDto } from './create-profile.dto.js';

/** Every field optional; `null` clears validAtUtc, latDeg, lonDeg; a new profile recomputes the figures. */
export class UpdateProfileDto extends PartialType(CreateProfileDto) {}
