
-- AlterEnum
ALTER TYPE "CustodyAction" ADD VALUE 'TEST_STARTED';

-- AlterTable
ALTER TABLE "Roll" ADD COLUMN     "retainUntil" TIMESTAMP(3);

-- AlterTable
ALTER TABLE "Coupon" ADD COLUMN     "retainUntil" TIMESTAMP(3);

