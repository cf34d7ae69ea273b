import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * Review requests and revision comments. A request changes once, from open to its outcome; triggers
 * refuse any change of a closed request, any change of who and what it is about, and every delete.
 * Comments are part of the record: never updated or deleted.
 */
export class CreateReviews1796500000001 implements MigrationInterface {
  name = 'CreateReviews1796500000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "review_requests" ("id" varchar PRIMARY KEY NOT NULL, "revisionId" varchar NOT NULL, "projectId" varchar NOT NULL, "requestedById" varchar NOT NULL, "reviewerId" varchar NOT NULL, "note" text NOT NULL DEFAULT (''), "state" varchar CHECK( "state" IN ('open','approved','changes-requested','withdrawn') ) NOT NULL DEFAULT ('open'), "createdAt" datetime NOT NULL, "decidedAt" datetime, "decisionComment" text, "signedHash" varchar(64), CONSTRAINT "FK_review_requests_revision" FOREIGN KEY ("revisionId") REFERENCES "revisions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_requestedBy" FOREIGN KEY ("requestedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_reviewer" FOREIGN KEY ("reviewerId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_review_requests_requester" ON "review_requests" ("requestedById", "state")`);
    await execute(queryRunner, `CREATE INDEX "IDX_review_requests_reviewer" ON "review_requests" ("reviewerId", "state")`);
    await execute(queryRunner, `CREATE INDEX "IDX_review_requests_revision" ON "review_requests" ("revisionId")`);
    await createRefusingTrigger(queryRunner, { name: 'TRG_review_requests_final', table: 'review_requests', event: 'UPDATE', when: `OLD."state" <> 'open'`, message: 'a decided or withdrawn review request is final' });
    await createRefusingTrigger(queryRunner, { name: 'TRG_review_requests_identity', table: 'review_requests', event: 'UPDATE', columns: ['id', 'revisionId', 'projectId', 'requestedById', 'reviewerId', 'note', 'createdAt'], message: 'a review request keeps who and what it is about' });
    await createRefusingTrigger(queryRunner, { name: 'TRG_review_requests_no_delete', table: 'review_requests', event: 'DELETE', message: 'review requests are kept' });
    await execute(queryRunner,
      `CREATE TABLE "revision_comments" ("id" varchar PRIMARY KEY NOT NULL, "revisionId" varchar NOT NULL, "deviceId" varchar, "deviceName" varchar(50), "authorId" varchar NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL, CONSTRAINT "FK_revision_comments_revision" FOREIGN KEY ("revisionId") REFERENCES "revisions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revision_comments_author" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_revision_comments_revision" ON "revision_comments" ("revisionId", "createdAt")`);
    await createRefusingTrigger(queryRunner, { name: 'TRG_revision_comments_no_update', table: 'revision_comments', event: 'UPDATE', message: 'comments are part of the record' });
    await createRefusingTrigger(queryRunner, { name: 'TRG_revision_comments_no_delete', table: 'revision_comments', event: 'DELETE', message: 'comments are part of the record' });
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropTrigger(queryRunner, 'TRG_revision_comments_no_delete', 'revision_comments');
    await dropTrigger(queryRunner, 'TRG_revision_comments_no_update', 'revision_comments');
    await execute(queryRunner, `DROP INDEX "IDX_revision_comments_revision"`);
    await execute(queryRunner, `DROP TABLE "revision_comments"`);
    await dropTrigger(queryRunner, 'TRG_review_requests_no_delete', 'review_requests');
    await dropTrigger(queryRunner, 'TRG_review_requests_identity', 'review_requests');
    await dropTrigger(queryRunner, 'TRG_review_requests_final', 'review_requests');
    await execute(queryRunner, `DROP INDEX "IDX_review_requests_revision"`);
    await execute(queryRunner, `DROP INDEX "IDX_review_requests_reviewer"`);
    await execute(queryRunner, `DROP INDEX "IDX_review_requests_requester"`);
    await execute(queryRunner, `DROP TABLE "review_requests"`);
  }
}
