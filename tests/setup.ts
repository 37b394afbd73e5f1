// Tests never read the developer's database or secret: each worker gets its own throwaway files.
process.env.MOTTLE_MODE ??= "test";
