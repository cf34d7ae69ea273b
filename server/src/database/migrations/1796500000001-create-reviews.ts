import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Review requests and revision comments. A request changes once, from open to its outcome; triggers
 * refuse any change of a closed request, any change of who and what it is about, and every delete.
 * Comments are part of the record: never updated or deleted.
 */
export class CreateReviews1796500000001 implements MigrationInterface {
  name = 'CreateReviews1796500000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "review_requests" ("id" varchar PRIMARY KEY NOT NULL, "revisionId" varchar NOT NULL, "projectId" varchar NOT NULL, "requestedById" varchar NOT NULL, "reviewerId" varchar NOT NULL, "note" text NOT NULL DEFAULT (''), "state" varchar CHECK( "state" IN ('open','approved','changes-requested','withdrawn') ) NOT NULL DEFAULT ('open'), "createdAt" datetime NOT NULL, "decidedAt" datetime, "decisionComment" text, "signedHash" varchar(64), CONSTRAINT "FK_review_requests_revision" FOREIGN KEY ("revisionId") REFERENCES "revisions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_requestedBy" FOREIGN KEY ("requestedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_review_requests_reviewer" FOREIGN KEY ("reviewerId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_review_requests_requester" ON "review_requests" ("requestedById", "state")`);
    await queryRunner.query(`CREATE INDEX "IDX_review_requests_reviewer" ON "review_requests" ("reviewerId", "state")`);
    await queryRunner.query(`CREATE INDEX "IDX_review_requests_revision" ON "review_requests" ("revisionId")`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_review_requests_final" BEFORE UPDATE ON "review_requests" WHEN OLD."state" <> 'open' BEGIN SELECT RAISE(ABORT, 'a decided or withdrawn review request is final'); END`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "TRG_review_requests_identity" BEFORE UPDATE OF "id", "revisionId", "projectId", "requestedById", "reviewerId", "note", "createdAt" ON "review_requests" BEGIN SELECT RAISE(ABORT, 'a review request keeps who and what it is about'); END`,
    );
    await queryRunner.query(`CREATE TRIGGER "TRG_review_requests_no_delete" BEFORE DELETE ON "review_requests" BEGIN SELECT RAISE(ABORT, 'review requests are kept'); END`);
    await queryRunner.query(
      `CREATE TABLE "revision_comments" ("id" varchar PRIMARY KEY NOT NULL, "revisionId" varchar NOT NULL, "deviceId" varchar, "deviceName" varchar(50), "authorId" varchar NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL, CONSTRAINT "FK_revision_comments_revision" FOREIGN KEY ("revisionId") REFERENCES "revisions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revision_comments_author" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_revision_comments_revision" ON "revision_comments" ("revisionId", "createdAt")`);
    await queryRunner.query(`CREATE TRIGGER "TRG_revision_comments_no_update" BEFORE UPDATE ON "revision_comments" BEGIN SELECT RAISE(ABORT, 'comments are part of the record'); END`);
    await queryRunner.query(`CREATE TRIGGER "TRG_revision_comments_no_delete" BEFORE DELETE ON "revision_comments" BEGIN SELECT RAISE(ABORT, 'comments are part of the record'); END`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "TRG_revision_comments_no_delete"`);
    await queryRunner.query(`DROP TRIGGER "TRG_revision_comments_no_update"`);
    await queryRunner.query(`DROP INDEX "IDX_revision_comments_revision"`);
    await queryRunner.query(`DROP TABLE "revision_comments"`);
    await queryRunner.query(`DROP TRIGGER "TRG_review_requests_no_delete"`);
    await queryRunner.query(`DROP TRIGGER "TRG_review_requests_identity"`);
    await queryRunner.query(`DROP TRIGGER "TRG_review_requests_final"`);
    await queryRunner.query(`DROP INDEX "IDX_review_requests_revision"`);
    await queryRunner.query(`DROP INDEX "IDX_review_requests_reviewer"`);
    await queryRunner.query(`DROP INDEX "IDX_review_requests_requester"`);
    await queryRunner.query(`DROP TABLE "review_requests"`);
  }
}
