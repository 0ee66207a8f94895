#include "pinproof/core/output_file.hpp"

#include <fcntl.h>
#include <signal.h>
#include <sys/random.h>
#include <sys/stat.h>
#include <unistd.h>

#include <atomic>
#include <cerrno>
#include <climits>
#include <cstdlib>
#include <cstring>
#include <algorithm>
#include <memory>
#include <ostream>
#include <optional>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/input_file.hpp"

namespace pinproof {
namespace {

// --- Temporaries that a signal handler may have to remove -----------------
// A fixed table, so that the handler touches no allocator: a slot holds a
// path while its state is `live`.
constexpr int slot_free = 0, slot_filling = 1, slot_live = 2;
constexpr std::size_t slot_count = 16;
struct temp_slot {
    std::atomic<int> state{slot_free};
    char path[PATH_MAX + 1] = {};
};
temp_slot slots[slot_count];
std::atomic<std::size_t> commits_done{0};
static_assert(std::atomic<int>::is_always_lock_free && std::atomic<std::size_t>::is_always_lock_free,
              "a signal handler reads these");

int claim_slot(const std::string& path)
{
    if (path.size() > PATH_MAX) return -1;
    for (std::size_t i = 0; i < slot_count; ++i) {
        int expected = slot_free;
        if (slots[i].state.compare_exchange_strong(expected, slot_filling)) {
            std::memcpy(slots[i].path, path.c_str(), path.size() + 1);
            slots[i].state.store(slot_live);
            return static_cast<int>(i);
        }
    }
    return -1;
}

void release_slot(int i)
{
    if (i >= 0) slots[static_cast<std::size_t>(i)].state.store(slot_free);
}

// Blocks the signals that end a run (SIGINT, SIGTERM, SIGHUP) in this thread
// for its lifetime: a temporary is created and recorded, and the targets are
// renamed, without a handler running in between.
class signals_blocked {
public:
    signals_blocked()
    {
        sigset_t s;
        sigemptyset(&s);
        sigaddset(&s, SIGINT);
        sigaddset(&s, SIGTERM);
        sigaddset(&s, SIGHUP);
        pthread_sigmask(SIG_BLOCK, &s, &previous_);
    }
    ~signals_blocked() { pthread_sigmask(SIG_SETMASK, &previous_, nullptr); }
    signals_blocked(const signals_blocked&) = delete;
    signals_blocked& operator=(const signals_blocked&) = delete;

private:
    sigset_t previous_;
};

std::string why(int e) { return std::strerror(e); }

std::string directory_of(const std::string& path)
{
    const auto slash = path.find_last_of('/');
    if (slash == std::string::npos) return ".";
    return slash == 0 ? "/" : path.substr(0, slash);
}

std::string base_of(const std::string& path)
{
    const auto slash = path.find_last_of('/');
    return slash == std::string::npos ? path : path.substr(slash + 1);
}

const char* kind_of(mode_t mode)
{
    if (S_ISDIR(mode)) return "a directory";
    if (S_ISFIFO(mode)) return "a FIFO (named pipe)";
    if (S_ISCHR(mode)) return "a character device";
    if (S_ISBLK(mode)) return "a block device";
    if (S_ISSOCK(mode)) return "a socket";
    if (S_ISLNK(mode)) return "a symbolic link";
    return "a special file";
}

file_identity identity(const struct stat& st)
{
    return {static_cast<std::uintmax_t>(st.st_dev), static_cast<std::uintmax_t>(st.st_ino)};
}

// A target after its checks: where to write, and what it replaces.
struct resolved_target {
    std::string option, path;   // as given
    std::string write_path;     // the file replaced: `path`, or the file a link of ours points to
    std::string key;            // canonical name, to find two outputs naming one new file
    std::optional<struct stat> existing;
};

resolved_target resolve(const std::string& option, const std::string& path, const std::vector<file_identity>& inputs)
{
    resolved_target t{option, path, path, {}, {}};
    if (path.empty())
        throw input_error(option, "expected a file name, or '-' for standard output, found an empty name");
    const std::string named = "\"" + path + "\"";
    struct stat link {};
    if (::lstat(path.c_str(), &link) != 0) {
        if (errno != ENOENT) throw input_error(option, "cannot examine " + named + ": " + why(errno));
        // A new file: its directory must exist.
        char dir[PATH_MAX];
        if (!::realpath(directory_of(path).c_str(), dir))
            throw input_error(option, "cannot write " + named + ": its folder " + directory_of(path) +
                                          " cannot be used (" + why(errno) + ")");
        t.key = std::string(dir) + "/" + base_of(path);
        return t;
    }
    struct stat target = link;
    if (S_ISLNK(link.st_mode)) {
        if (link.st_uid != ::geteuid())
            throw input_error(option, named + " is a symbolic link owned by another user (uid " +
                                          std::to_string(link.st_uid) +
                                          "); refusing to write through it. Name the file itself.");
        if (::stat(path.c_str(), &target) != 0)
            throw input_error(option, named + " is a symbolic link to a file that does not exist (" + why(errno) +
                                          "); refusing to create a file through it. Name the file itself.");
        char real[PATH_MAX];
        if (!::realpath(path.c_str(), real)) throw input_error(option, "cannot resolve " + named + ": " + why(errno));
        t.write_path = real;
    }
    for (const auto& in : inputs)
        if (in == identity(target))
            throw input_error(option, named + " is an input of this run (the same file, compared by device and "
                                          "inode); refusing to overwrite it. Name another output file.");
    if (!S_ISREG(target.st_mode))
        throw input_error(option, "expected " + named + " to be a regular file to replace, found " +
                                      kind_of(target.st_mode) + (S_ISLNK(link.st_mode) ? " behind a symbolic link" : "") +
                                      "; nothing was written (use '-' for standard output)");
    t.existing = target;
    char real[PATH_MAX];
    t.key = ::realpath(path.c_str(), real) ? std::string(real) : t.write_path;
    return t;
}

std::vector<resolved_target> resolve_all(const std::vector<std::pair<std::string, std::string>>& targets,
                                         const std::vector<std::string>& named_inputs)
{
    std::vector<file_identity> inputs = input_files_read();
    for (const auto& p : named_inputs) {
        struct stat st {};
        if (!p.empty() && p != "-" && ::stat(p.c_str(), &st) == 0) inputs.push_back(identity(st));
    }
    std::vector<resolved_target> out;
    for (const auto& [option, path] : targets) {
        resolved_target t = resolve(option, path, inputs);
        for (const auto& o : out) {
            const bool same = o.key == t.key ||
                              (o.existing && t.existing && identity(*o.existing) == identity(*t.existing));
            if (same)
                throw input_error(option, "\"" + path + "\" is also the file of " + o.option +
                                              "; two outputs cannot share a file");
        }
        out.push_back(std::move(t));
    }
    return out;
}

void write_bytes(int fd, const char* p, std::size_t left, const std::string& shown)
{
    while (left > 0) {
        const ssize_t n = ::write(fd, p, left);
        if (n < 0) {
            if (errno == EINTR) continue;
            throw error("cannot write " + shown + ": " + why(errno));
        }
        p += n;
        left -= static_cast<std::size_t>(n);
    }
}

// A temporary beside its target, removed on destruction unless renamed.
class temporary {
public:
    explicit temporary(const resolved_target& t)
    {
        const std::string dir = directory_of(t.write_path);
        // Room for the prefix and the random part within NAME_MAX.
        const std::string base = base_of(t.write_path).substr(0, 200);
        for (int attempt = 0; attempt < 100; ++attempt) {
            unsigned char r[12];
            if (::getrandom(r, sizeof r, 0) != static_cast<ssize_t>(sizeof r))
                throw error("cannot write " + t.path + ": no random source for a temporary name");
            std::string name = dir + "/." + base + ".pinproof-";
            static const char hex[] = "0123456789abcdef";
            for (unsigned char c : r) {
                name += hex[c >> 4];
                name += hex[c & 15];
            }
            signals_blocked blocked;
            const int fd = ::open(name.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_NOFOLLOW | O_CLOEXEC, 0666);
            if (fd < 0) {
                if (errno == EEXIST) continue;
                throw error("cannot write " + t.path + ": " + why(errno));
            }
            fd_ = fd;
            path_ = name;
            slot_ = claim_slot(name);
            break;
        }
        if (fd_ < 0) throw error("cannot write " + t.path + ": no free temporary name in " + dir);
        if (t.existing) {
            // Keep the owner (where permitted) and the permissions of the file replaced.
            if (::fchown(fd_, t.existing->st_uid, t.existing->st_gid) != 0) { /* not permitted: keep ours */ }
            if (::fchmod(fd_, t.existing->st_mode & 0777) != 0) throw error("cannot write " + t.path + ": " + why(errno));
        }
    }
    ~temporary()
    {
        if (fd_ >= 0) ::close(fd_);
        if (!path_.empty()) {
            signals_blocked blocked;
            ::unlink(path_.c_str());
            release_slot(slot_);
        }
    }
    temporary(const temporary&) = delete;
    temporary& operator=(const temporary&) = delete;

    void write(const std::string& content, const std::string& shown) { write(content, nullptr, "", shown); }

    // `head`, the bytes of `body` (when given) and `tail`, then to the disk.
    void write(const std::string& head, scratch_file* body, const std::string& tail, const std::string& shown)
    {
        write_bytes(fd_, head.data(), head.size(), shown);
        if (body) body->copy_to(fd_, shown);
        write_bytes(fd_, tail.data(), tail.size(), shown);
        if (::fsync(fd_) != 0) throw error("cannot write " + shown + ": " + why(errno));
        const int fd = fd_;
        fd_ = -1;
        if (::close(fd) != 0) throw error("cannot write " + shown + ": " + why(errno));
    }

    // Called with the signals blocked. After it, the destructor removes nothing.
    int rename_to(const std::string& target)
    {
        if (::rename(path_.c_str(), target.c_str()) != 0) return errno;
        path_.clear();
        release_slot(slot_);
        return 0;
    }

private:
    int fd_ = -1;
    int slot_ = -1;
    std::string path_;
};

void sync_directory(const std::string& path)
{
    const int fd = ::open(directory_of(path).c_str(), O_RDONLY | O_DIRECTORY | O_CLOEXEC);
    if (fd < 0) return;
    ::fsync(fd);  // best effort: the rename itself has been made
    ::close(fd);
}

}  // namespace

void output_set::add(std::string option, std::string path, std::string content)
{
    outputs_.push_back({std::move(option), std::move(path), std::move(content), nullptr, ""});
}

void output_set::add(std::string option, std::string path, std::string head, std::shared_ptr<scratch_file> body,
                     std::string tail)
{
    outputs_.push_back({std::move(option), std::move(path), std::move(head), std::move(body), std::move(tail)});
}

void output_set::add_input(std::string path)
{
    if (path == "-") return;  // standard input has no name an output could take
    inputs_.push_back(std::move(path));
}

void output_set::check() const
{
    std::vector<std::pair<std::string, std::string>> targets;
    for (const auto& o : outputs_) targets.emplace_back(o.option, o.path);
    resolve_all(targets, inputs_);
}

void output_set::commit()
{
    std::vector<std::pair<std::string, std::string>> targets;
    for (const auto& o : outputs_) targets.emplace_back(o.option, o.path);
    const std::vector<resolved_target> resolved = resolve_all(targets, inputs_);

    std::vector<std::unique_ptr<temporary>> temps;
    for (std::size_t i = 0; i < outputs_.size(); ++i) {
        temps.push_back(std::make_unique<temporary>(resolved[i]));
        temps.back()->write(outputs_[i].content, outputs_[i].body.get(), outputs_[i].tail, outputs_[i].path);
    }
    std::string failed;
    {
        signals_blocked blocked;
        for (std::size_t i = 0; i < temps.size(); ++i) {
            if (const int e = temps[i]->rename_to(resolved[i].write_path)) {
                failed = "cannot write " + outputs_[i].path + ": " + why(e);
                if (i > 0) {
                    failed += " (already in place:";
                    for (std::size_t j = 0; j < i; ++j) failed += " " + outputs_[j].path;
                    failed += ")";
                }
                break;
            }
        }
        if (failed.empty()) commits_done.fetch_add(1);
    }
    if (!failed.empty()) throw error(failed);
    for (const auto& r : resolved) sync_directory(r.write_path);
}

void write_file_atomically(const std::string& path, const std::string& content)
{
    output_set s;
    s.add("(output)", path, content);
    s.commit();
}

scratch_file::scratch_file(const std::string& target)
{
    std::string dir;
    if (target == "-" || target.empty()) {
        const char* tmp = std::getenv("TMPDIR");
        dir = tmp && *tmp ? tmp : "/tmp";
    } else {
        dir = directory_of(target);
    }
    shown_ = "a scratch file in " + dir;
    // Unnamed where the file system allows (Linux O_TMPFILE): nothing to
    // remove, whatever ends the process. Else a named file removed at once.
    fd_ = ::open(dir.c_str(), O_TMPFILE | O_RDWR | O_CLOEXEC, 0600);
    if (fd_ < 0) {
        std::string name = dir + "/.pinproof-scratch-XXXXXX";
        signals_blocked blocked;
        fd_ = ::mkostemp(name.data(), O_CLOEXEC);
        if (fd_ < 0) throw error("cannot write " + shown_ + ": " + why(errno));
        ::unlink(name.c_str());
    }
    buffer_.reserve(buffer_bytes);
}

scratch_file::~scratch_file()
{
    if (fd_ >= 0) ::close(fd_);
}

void scratch_file::append(std::string_view text)
{
    if (buffer_.size() + text.size() > buffer_bytes) flush();
    if (text.size() > buffer_bytes) {
        write_bytes(fd_, text.data(), text.size(), shown_);
        written_ += text.size();
    } else {
        buffer_.append(text);
    }
}

void scratch_file::flush()
{
    write_bytes(fd_, buffer_.data(), buffer_.size(), shown_);
    written_ += buffer_.size();
    buffer_.clear();
}

void scratch_file::clear()
{
    buffer_.clear();
    buffer_.shrink_to_fit();
    written_ = 0;
    if (::ftruncate(fd_, 0) != 0 || ::lseek(fd_, 0, SEEK_SET) != 0) throw error("cannot write " + shown_ + ": " + why(errno));
}

void scratch_file::copy_to(int fd, const std::string& shown)
{
    flush();
    off_t from = 0;
    std::uintmax_t left = written_;
    // In the kernel where it can (copy_file_range), else through a buffer.
    while (left > 0) {
        const ssize_t n = ::copy_file_range(fd_, &from, fd, nullptr, left, 0);
        if (n <= 0) break;
        left -= static_cast<std::uintmax_t>(n);
    }
    std::string buf(std::size_t{1} << 16, '\0');
    while (left > 0) {
        const ssize_t n = ::pread(fd_, buf.data(), std::min<std::uintmax_t>(left, buf.size()), from);
        if (n < 0 && errno == EINTR) continue;
        if (n <= 0) throw error("cannot write " + shown + ": cannot read back " + shown_ + ": " + why(n < 0 ? errno : EIO));
        write_bytes(fd, buf.data(), static_cast<std::size_t>(n), shown);
        from += n;
        left -= static_cast<std::uintmax_t>(n);
    }
}

void scratch_file::copy_to(std::ostream& out)
{
    flush();
    std::string buf(std::size_t{1} << 16, '\0');
    off_t from = 0;
    for (std::uintmax_t left = written_; left > 0;) {
        const ssize_t n = ::pread(fd_, buf.data(), std::min<std::uintmax_t>(left, buf.size()), from);
        if (n < 0 && errno == EINTR) continue;
        if (n <= 0) throw error("cannot read back " + shown_ + ": " + why(n < 0 ? errno : EIO));
        out.write(buf.data(), n);
        from += n;
        left -= static_cast<std::uintmax_t>(n);
    }
}

void remove_output_temporaries() noexcept
{
    for (auto& s : slots)
        if (s.state.load() == slot_live) ::unlink(s.path);
}

std::size_t completed_output_commits() noexcept { return commits_done.load(); }

}  // namespace pinproof
