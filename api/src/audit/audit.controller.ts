import type { ListResponse } from '@hopwise/common';
import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { AuditListDto, type AuditEntryView } from './audit-entry-view.js';
import { AuditRepository } from './audit.repository.js';
import { ListAuditQuery } from './dto/list-audit.query.js';

const DEFAULT_PAGE = 50;

/** The audit log of changes (admin actions, publishing, edits), newest first. */
@ApiTags('audit')
@ApiBearerAuth()
@RequirePermission('audit:read')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditRepository) {}

  @Get()
  @ApiOperation({ summary: 'Audit entries, newest first; filter by action prefix, actor, target' })
  @ApiOkResponse({ type: AuditListDto })
  list(@Query() query: ListAuditQuery): ListResponse<AuditEntryView> {
    const { rows, total } = this.audit.list({
      limit: query.limit ?? DEFAULT_PAGE,
      offset: query.offset ?? 0,
      action: query.action,
      actorUserId: query.actorUserId,
      target: query.target,
    });
    return { items: rows, total };
  }
}
