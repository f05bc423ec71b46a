#include "store/sqlite.hpp"

#include "beamwarden/store/labstore.hpp"

#include <fmt/core.h>
#include <sqlite3.h>

#include <filesystem>
#include <string>
#include <system_error>
#include <utility>

namespace beamwarden::store {

namespace {

// Long enough for another Beamwarden window to finish a save; short enough that a stuck writer is reported.
constexpr int kBusyTimeoutMs = 5000;

// A lab file moved, removed or replaced while open: in WAL mode SQLite goes on committing into the journal beside the
// old path and reports success for records that no file at the path holds. SQLITE_FCNTL_HAS_MOVED compares the open
// file with what the path names now (unix VFS: missing, or another inode).
Result<void> requireFileInPlace(sqlite3* db)
{
    int moved = 0;
    if (sqlite3_file_control(db, "main", SQLITE_FCNTL_HAS_MOVED, &moved) != SQLITE_OK || moved == 0)
        return {};
    const char* name = sqlite3_db_filename(db, "main");
    return fail(std::string(kStorageField),
                fmt::format("the lab file {} was moved, removed or replaced while it was open, so nothing was saved; "
                            "open it again from where it is now (or save this lab elsewhere with Backup)",
                            name != nullptr ? name : "(unnamed)"),
                "");
}

} // namespace

InputError sqliteError(sqlite3* db, int code, std::string_view field)
{
    const std::string text = db != nullptr ? sqlite3_errmsg(db) : sqlite3_errstr(code);
    if ((code & 0xff) == SQLITE_CONSTRAINT)
        return InputError{std::string(field), text, "values the lab file's rules accept"};
    return InputError{std::string(kStorageField), text, ""};
}

// ---- Statement

Statement::Statement(Statement&& other) noexcept
    : m_db(std::exchange(other.m_db, nullptr)), m_statement(std::exchange(other.m_statement, nullptr))
{
}

Statement& Statement::operator=(Statement&& other) noexcept
{
    if (this != &other) {
        sqlite3_finalize(m_statement);
        m_db = std::exchange(other.m_db, nullptr);
        m_statement = std::exchange(other.m_statement, nullptr);
    }
    return *this;
}

Statement::~Statement()
{
    sqlite3_finalize(m_statement);
}

Result<Statement> Statement::prepare(sqlite3* db, std::string_view sql)
{
    sqlite3_stmt* statement = nullptr;
    const int code = sqlite3_prepare_v2(db, sql.data(), static_cast<int>(sql.size()), &statement, nullptr);
    if (code != SQLITE_OK) {
        sqlite3_finalize(statement);
        return std::unexpected(sqliteError(db, code, "lab file"));
    }
    return Statement(db, statement);
}

Statement& Statement::bind(int index, double value)
{
    sqlite3_bind_double(m_statement, index, value);
    return *this;
}

Statement& Statement::bind(int index, std::int64_t value)
{
    sqlite3_bind_int64(m_statement, index, value);
    return *this;
}

Statement& Statement::bind(int index, std::string_view value)
{
    sqlite3_bind_text(m_statement, index, value.data(), static_cast<int>(value.size()), SQLITE_TRANSIENT);
    return *this;
}

Statement& Statement::bindNull(int index)
{
    sqlite3_bind_null(m_statement, index);
    return *this;
}

Result<bool> Statement::step(std::string_view field)
{
    const int code = sqlite3_step(m_statement);
    if (code == SQLITE_ROW)
        return true;
    if (code == SQLITE_DONE)
        return false;
    // The statement's own code is generic after a failed step; the connection holds the extended one.
    return std::unexpected(sqliteError(m_db, sqlite3_extended_errcode(m_db), field));
}

Result<void> Statement::run(std::string_view field)
{
    for (;;) {
        auto more = step(field);
        if (!more)
            return std::unexpected(more.error());
        if (!*more)
            break;
    }
    reset();
    return {};
}

void Statement::reset()
{
    sqlite3_reset(m_statement);
    sqlite3_clear_bindings(m_statement);
}

double Statement::real(int column) const
{
    return sqlite3_column_double(m_statement, column);
}

std::int64_t Statement::integer(int column) const
{
    return sqlite3_column_int64(m_statement, column);
}

std::string Statement::text(int column) const
{
    const auto* bytes = sqlite3_column_text(m_statement, column);
    const int size = sqlite3_column_bytes(m_statement, column);
    if (bytes == nullptr)
        return {};
    return std::string(reinterpret_cast<const char*>(bytes), static_cast<std::size_t>(size));
}

bool Statement::isNull(int column) const
{
    return sqlite3_column_type(m_statement, column) == SQLITE_NULL;
}

// ---- Connection

Connection::Connection(Connection&& other) noexcept : m_db(std::exchange(other.m_db, nullptr)) {}

Connection& Connection::operator=(Connection&& other) noexcept
{
    if (this != &other) {
        close();
        m_db = std::exchange(other.m_db, nullptr);
    }
    return *this;
}

Connection::~Connection()
{
    close();
}

void Connection::close()
{
    closeHandle(m_db);
    m_db = nullptr;
}

Result<Connection> Connection::open(const std::filesystem::path& path, OpenMode mode)
{
    int flags = SQLITE_OPEN_NOMUTEX;
    switch (mode) {
    case OpenMode::ReadOnly:
        flags |= SQLITE_OPEN_READONLY;
        break;
    case OpenMode::ReadWrite:
        flags |= SQLITE_OPEN_READWRITE;
        break;
    case OpenMode::Create:
        flags |= SQLITE_OPEN_READWRITE | SQLITE_OPEN_CREATE;
        break;
    }
    sqlite3* db = nullptr;
    const int code = sqlite3_open_v2(path.c_str(), &db, flags, nullptr);
    Connection connection(db);
    if (code != SQLITE_OK)
        return std::unexpected(InputError{std::string(kStorageField),
                                          path.string() + ": " + (db ? sqlite3_errmsg(db) : sqlite3_errstr(code)), ""});
    sqlite3_extended_result_codes(db, 1);
    sqlite3_busy_timeout(db, kBusyTimeoutMs);
    return connection;
}

// ---- free helpers

void closeHandle(sqlite3* db)
{
    if (db == nullptr)
        return;
    int moved = 0;
    std::string path;
    if (sqlite3_file_control(db, "main", SQLITE_FCNTL_HAS_MOVED, &moved) == SQLITE_OK && moved != 0) {
        // SQLite does not checkpoint a moved file on close, so its journal would stay beside the path and be replayed
        // into whatever file is put there next. Everything in it goes into the file it belongs to (still open here,
        // wherever it is now), and the journal is emptied.
        sqlite3_wal_checkpoint_v2(db, "main", SQLITE_CHECKPOINT_TRUNCATE, nullptr, nullptr);
        if (const char* name = sqlite3_db_filename(db, "main"); name != nullptr)
            path = name;
    }
    sqlite3_close_v2(db);
    // With no file at the path, the -wal and -shm left there belong to none; a file that comes later must not find
    // them. With another file there, they may be that file's now, and stay.
    if (!path.empty()) {
        std::error_code error;
        if (!std::filesystem::exists(path, error) && !error) {
            std::filesystem::remove(path + "-wal", error);
            std::filesystem::remove(path + "-shm", error);
        }
    }
}

Result<void> execute(sqlite3* db, std::string_view sql, std::string_view field)
{
    const std::string text(sql);
    const int code = sqlite3_exec(db, text.c_str(), nullptr, nullptr, nullptr);
    if (code != SQLITE_OK)
        return std::unexpected(sqliteError(db, sqlite3_extended_errcode(db), field));
    return {};
}

Result<std::int64_t> queryInteger(sqlite3* db, std::string_view sql)
{
    auto statement = Statement::prepare(db, sql);
    if (!statement)
        return std::unexpected(statement.error());
    auto row = statement->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? statement->integer(0) : 0;
}

std::int64_t lastInsertId(sqlite3* db)
{
    return sqlite3_last_insert_rowid(db);
}

int changedRows(sqlite3* db)
{
    return sqlite3_changes(db);
}

// ---- Transaction

Transaction::Transaction(Transaction&& other) noexcept : m_db(std::exchange(other.m_db, nullptr)) {}

Transaction::~Transaction()
{
    if (m_db != nullptr)
        sqlite3_exec(m_db, "ROLLBACK", nullptr, nullptr, nullptr);
}

Result<Transaction> Transaction::begin(sqlite3* db)
{
    if (auto begun = execute(db, "BEGIN IMMEDIATE"); !begun)
        return std::unexpected(begun.error());
    Transaction transaction(db);
    // Checked under the write lock, so the answer holds for this transaction; the destructor rolls back.
    if (auto inPlace = requireFileInPlace(db); !inPlace)
        return std::unexpected(inPlace.error());
    return transaction;
}

Result<Transaction> Transaction::beginRead(sqlite3* db)
{
    if (auto begun = execute(db, "BEGIN DEFERRED"); !begun)
        return std::unexpected(begun.error());
    return Transaction(db);
}

Result<void> Transaction::commit()
{
    // Again at the end: a removal during a long write (an import) must not commit into the old file's journal.
    if (auto inPlace = requireFileInPlace(m_db); !inPlace)
        return std::unexpected(inPlace.error());
    const int code = sqlite3_exec(m_db, "COMMIT", nullptr, nullptr, nullptr);
    if (code != SQLITE_OK) {
        // A failed COMMIT (e.g. a deferred foreign key) leaves the transaction open; the destructor rolls it back.
        return std::unexpected(sqliteError(m_db, sqlite3_extended_errcode(m_db), "lab file"));
    }
    m_db = nullptr;
    return {};
}

} // namespace beamwarden::store
