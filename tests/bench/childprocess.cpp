#include "childprocess.hpp"

#include <chrono>
#include <csignal>
#include <cstring>

#include <poll.h>
#include <spawn.h>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

extern char** environ; // NOLINT: POSIX declares it nowhere else

namespace beamwarden::bench {

namespace {

using Clock = std::chrono::steady_clock;

double msSince(Clock::time_point start)
{
    return std::chrono::duration<double, std::milli>(Clock::now() - start).count();
}

std::vector<std::string> mergedEnvironment(const std::vector<std::string>& extra)
{
    std::vector<std::string> merged;
    for (char** e = environ; *e != nullptr; ++e) {
        const std::string entry = *e;
        const std::string name = entry.substr(0, entry.find('='));
        bool replaced = false;
        for (const std::string& x : extra)
            replaced = replaced || x.substr(0, x.find('=')) == name;
        if (!replaced)
            merged.push_back(entry);
    }
    merged.insert(merged.end(), extra.begin(), extra.end());
    return merged;
}

std::vector<char*> pointers(std::vector<std::string>& strings)
{
    std::vector<char*> out;
    for (std::string& s : strings)
        out.push_back(s.data());
    out.push_back(nullptr);
    return out;
}

} // namespace

ChildRun runChild(const std::string& program, const std::vector<std::string>& arguments,
                  const std::vector<std::string>& environment, const std::string& waitFor, double timeout_s)
{
    ChildRun run;
    // Everything the child needs is built before the clock starts, so only the launch itself is timed.
    std::vector<std::string> argv{program};
    argv.insert(argv.end(), arguments.begin(), arguments.end());
    std::vector<std::string> envp = mergedEnvironment(environment);
    std::vector<char*> argvPointers = pointers(argv);
    std::vector<char*> envPointers = pointers(envp);
    int pipeEnds[2];
    if (::pipe(pipeEnds) != 0)
        return run;

    // posix_spawn, not fork: glibc starts the child without copying this process's page tables, so a large
    // measuring process does not slow the launch it times.
    posix_spawn_file_actions_t actions;
    posix_spawn_file_actions_init(&actions);
    posix_spawn_file_actions_adddup2(&actions, pipeEnds[1], STDOUT_FILENO);
    posix_spawn_file_actions_adddup2(&actions, pipeEnds[1], STDERR_FILENO);
    posix_spawn_file_actions_addclose(&actions, pipeEnds[0]);
    posix_spawn_file_actions_addclose(&actions, pipeEnds[1]);
    pid_t pid = 0;
    const auto start = Clock::now();
    const int spawned =
        ::posix_spawn(&pid, program.c_str(), &actions, nullptr, argvPointers.data(), envPointers.data());
    posix_spawn_file_actions_destroy(&actions);
    if (spawned != 0) {
        ::close(pipeEnds[0]);
        ::close(pipeEnds[1]);
        run.output = std::string("could not start ") + program + ": " + std::strerror(spawned);
        return run;
    }
    run.started = true;
    ::close(pipeEnds[1]);

    // Read until end of file (the child and anything it started closed the pipe) or the time is up.
    std::string pending;
    char buffer[4096];
    for (;;) {
        const double left_ms = timeout_s * 1000.0 - msSince(start);
        if (left_ms <= 0) {
            run.timedOut = true;
            ::kill(pid, SIGKILL);
            break;
        }
        pollfd fd{pipeEnds[0], POLLIN, 0};
        if (::poll(&fd, 1, static_cast<int>(left_ms) + 1) <= 0)
            continue;
        const ssize_t n = ::read(pipeEnds[0], buffer, sizeof buffer);
        if (n <= 0)
            break;
        run.output.append(buffer, static_cast<std::size_t>(n));
        if (run.untilLine_ms < 0 && !waitFor.empty()) {
            pending.append(buffer, static_cast<std::size_t>(n));
            for (auto newline = pending.find('\n'); newline != std::string::npos; newline = pending.find('\n')) {
                if (pending.compare(0, newline, waitFor) == 0) {
                    run.untilLine_ms = msSince(start);
                    break;
                }
                pending.erase(0, newline + 1);
            }
        }
    }
    ::close(pipeEnds[0]);

    int status = 0;
    rusage usage{};
    if (::wait4(pid, &status, 0, &usage) == pid) {
        run.untilExit_ms = msSince(start);
        run.peakResident_kB = usage.ru_maxrss; // Linux: kilobytes
        run.exitCode = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    }
    return run;
}

} // namespace beamwarden::bench
