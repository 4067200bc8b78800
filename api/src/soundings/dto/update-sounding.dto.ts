import { PartialType } from '@nestjs/swagger';
import { CreateSoundingDto } from './create-sounding.dto.js';

export class UpdateSoundingDto extends PartialType(CreateSoundingDto) {}
