-- The knowledge base search (features/toolkit/knowledge.ts): drizzle-kit does not declare FULLTEXT indexes.
ALTER TABLE `knowledge_entries` ADD FULLTEXT INDEX `knowledge_text_ft` (`brand`, `model`, `symptom`, `notes`, `measured`, `faulty_part`, `fix`);
