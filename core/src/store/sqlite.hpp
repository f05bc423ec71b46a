#pragma once
// Thin RAII over SQLite's C API for the store: a connection, a prepared statement and a transaction. Every failure
// comes back as an InputError; nothing here throws.
#include "beamwarden/error.hpp"

#include <cstdint>
#include <filesystem>
#include <optional>
#include <string>
#include <string_view>
#include <utility>

struct sqlite3;
struct sqlite3_stmt;

namespace beamwarden::store {

// The error for a failed SQLite call. A constraint or trigger refusal is reported as refused input under `field`;
// anything else (I/O, disk full, busy) carries the storage field so callers can tell "refused" from "failed".
[[nodiscard]] InputError sqliteError(sqlite3* db, int code, std::string_view field);

class Statement {
public:
    Statement() = default;
    Statement(Statement&& other) noexcept;
    Statement& operator=(Statement&& other) noexcept;
    Statement(const Statement&) = delete;
    Statement& operator=(const Statement&) = delete;
    ~Statement();

    [[nodiscard]] static Result<Statement> prepare(sqlite3* db, std::string_view sql);

    // Binds by 1-based position; each returns *this so a row reads as one chain.
    Statement& bind(int index, double value);
    Statement& bind(int index, std::int64_t value);
    Statement& bind(int index, int value) { return bind(index, static_cast<std::int64_t>(value)); }
    Statement& bind(int index, bool value) { return bind(index, static_cast<std::int64_t>(value ? 1 : 0)); }
    Statement& bind(int index, std::string_view value);
    Statement& bind(int index, const char* value) { return bind(index, std::string_view(value)); }
    Statement& bind(int index, const std::string& value) { return bind(index, std::string_view(value)); }
    Statement& bindNull(int index);

    // One step: true while a row is ready, false when done. `field` names what the statement writes for errors.
    [[nodiscard]] Result<bool> step(std::string_view field = "lab file");
    // Steps to completion, for statements that return no rows.
    [[nodiscard]] Result<void> run(std::string_view field = "lab file");
    void reset();

    [[nodiscard]] double real(int column) const;
    [[nodiscard]] std::int64_t integer(int column) const;
    [[nodiscard]] std::string text(int column) const;
    [[nodiscard]] bool isNull(int column) const;

private:
    explicit Statement(sqlite3* db, sqlite3_stmt* statement) : m_db(db), m_statement(statement) {}

    sqlite3* m_db = nullptr;
    sqlite3_stmt* m_statement = nullptr;
};

enum class OpenMode : std::uint8_t { ReadOnly, ReadWrite, Create };

class Connection {
public:
    Connection() = default;
    Connection(Connection&& other) noexcept;
    Connection& operator=(Connection&& other) noexcept;
    Connection(const Connection&) = delete;
    Connection& operator=(const Connection&) = delete;
    ~Connection();

    [[nodiscard]] static Result<Connection> open(const std::filesystem::path& path, OpenMode mode);

    [[nodiscard]] sqlite3* handle() const { return m_db; }
    // Hands the open handle to a new owner (LabStore).
    [[nodiscard]] sqlite3* release() { return std::exchange(m_db, nullptr); }
    void close();

private:
    explicit Connection(sqlite3* db) : m_db(db) {}

    sqlite3* m_db = nullptr;
};

// Runs one or more statements without results (schema text, pragmas).
[[nodiscard]] Result<void> execute(sqlite3* db, std::string_view sql, std::string_view field = "lab file");
// The first column of the first row as an integer (PRAGMA user_version and the like); 0 for no row.
[[nodiscard]] Result<std::int64_t> queryInteger(sqlite3* db, std::string_view sql);
[[nodiscard]] std::int64_t lastInsertId(sqlite3* db);
// Rows the last INSERT, UPDATE or DELETE changed.
[[nodiscard]] int changedRows(sqlite3* db);
// Closes a handle, deferring the close until any forgotten statement is finalised instead of failing. A file moved,
// removed or replaced while open gets its journal checkpointed into it first, and the -wal and -shm left at a path
// where no file is any more are removed, so no later file there can replay them.
void closeHandle(sqlite3* db);

// BEGIN IMMEDIATE takes the write lock up front, so two writers queue on busy_timeout instead of one failing at
// its first write; the destructor rolls back unless commit() succeeded.
class Transaction {
public:
    Transaction(Transaction&& other) noexcept;
    Transaction& operator=(Transaction&&) = delete;
    Transaction(const Transaction&) = delete;
    Transaction& operator=(const Transaction&) = delete;
    ~Transaction();

    [[nodiscard]] static Result<Transaction> begin(sqlite3* db);
    // A deferred transaction for reading several tables from one snapshot; nothing to commit.
    [[nodiscard]] static Result<Transaction> beginRead(sqlite3* db);
    [[nodiscard]] Result<void> commit();

private:
    explicit Transaction(sqlite3* db) : m_db(db) {}

    sqlite3* m_db = nullptr;
};

} // namespace beamwarden::store
