import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { TOOLS, type Tool } from '../vocabulary';
import { Plan } from './plan.entity';

/** A tool a plan needs: one row each, so that the library's "needs any of these tools" filter has an index. */
@Entity({ name: 'plan_tools' })
@Index('IDX_plan_tools_tool', ['tool', 'planId'])
export class PlanTool {
  @PrimaryColumn({ name: 'plan_id', type: 'int', unsigned: true })
  planId: number;

  @PrimaryColumn({ type: 'enum', enum: TOOLS })
  tool: Tool;

  @ManyToOne(() => Plan, (plan) => plan.tools, { onDelete: 'CASCADE', orphanedRowAction: 'delete' })
  @JoinColumn({ name: 'plan_id', foreignKeyConstraintName: 'FK_plan_tools_plan' })
  plan: Plan;
}
