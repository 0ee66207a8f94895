// Verification of writing outputs (src/core/output_file.cpp): one case per
// promise of docs/robustness.md, "Outputs: where and how they are written".
//
// References:
//   [POSIX] POSIX.1-2017, rename(): the target is replaced atomically; open()
//           with O_CREAT|O_EXCL fails if the name exists, also as a symbolic
//           link; O_NOFOLLOW (Linux open(2)) refuses a final symbolic link.
//   [ID]    Common practice, no source: two names denote the same file exactly
//           when stat() gives the same device and inode.
// No numerical tolerance: these cases compare file contents, modes and errors.
#include <doctest/doctest.h>

#include "temp_dir.hpp"

#include <sys/stat.h>
#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <memory>
#include <sstream>
#include <string>

#include "pinproof/core/errors.hpp"
#include "pinproof/core/input_file.hpp"
#include "pinproof/core/output_file.hpp"

namespace fs = std::filesystem;
using pinproof::input_error;
using pinproof::output_set;

namespace {

std::string contents(const fs::path& p)
{
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

std::size_t entries(const fs::path& dir)
{
    std::size_t n = 0;
    for ([[maybe_unused]] const auto& e : fs::directory_iterator(dir)) ++n;
    return n;
}

}  // namespace

TEST_CASE("output set [POSIX] - every output written and no temporary left")
{
    pinproof::testing::temp_dir dir("output-file");
    output_set s;
    s.add("--csv", (dir.path / "a.csv").string(), "a");
    s.add("--json", (dir.path / "b.json").string(), "b");
    s.commit();
    CHECK(contents(dir.path / "a.csv") == "a");
    CHECK(contents(dir.path / "b.json") == "b");
    CHECK(entries(dir.path) == 2);
}

TEST_CASE("output set [ID] - an input under another name is refused and left unchanged")
{
    pinproof::testing::temp_dir dir("output-file");
    const std::string input = dir.write("project.json", "{}");
    fs::create_symlink("project.json", dir.path / "link.json");
    fs::create_hard_link(dir.path / "project.json", dir.path / "hard.json");
    for (const char* name : {"project.json", "link.json", "hard.json"}) {
        CAPTURE(name);
        output_set s;
        s.add_input(input);
        s.add("--csv", (dir.path / "other.csv").string(), "first");
        s.add("--json", (dir.path / name).string(), "overwritten");
        CHECK_THROWS_AS(s.commit(), input_error);
        CHECK(contents(input) == "{}");
        CHECK_FALSE(fs::exists(dir.path / "other.csv"));  // nothing of the set was written
        CHECK(entries(dir.path) == 3);
    }
}

TEST_CASE("output set [ID] - a file read by read_input_file is an input without being named")
{
    pinproof::testing::temp_dir dir("output-file");
    const std::string catalogue = dir.write("details.json", "{\"format\": 1}");
    CHECK(pinproof::read_input_file(catalogue, "detail catalogue") == "{\"format\": 1}");
    output_set s;
    s.add("--json", catalogue, "x");
    CHECK_THROWS_AS(s.commit(), input_error);
    CHECK(contents(catalogue) == "{\"format\": 1}");
}

TEST_CASE("output set [POSIX] - the mode of a file replaced is kept")
{
    pinproof::testing::temp_dir dir("output-file");
    const std::string target = dir.write("result.json", "old");
    ::chmod(target.c_str(), 0640);
    pinproof::write_file_atomically(target, "new");
    struct stat st {};
    REQUIRE(::stat(target.c_str(), &st) == 0);
    CHECK((st.st_mode & 0777) == 0640);
    CHECK(contents(target) == "new");
}

TEST_CASE("output set [POSIX] - a FIFO or a directory or a device is not replaced")
{
    pinproof::testing::temp_dir dir("output-file");
    const fs::path fifo = dir.path / "pipe";
    REQUIRE(::mkfifo(fifo.c_str(), 0600) == 0);
    fs::create_directory(dir.path / "folder");
    fs::create_symlink("/dev/null", dir.path / "to-device");
    for (const fs::path& p : {fifo, dir.path / "folder", fs::path("/dev/null"), dir.path / "to-device"}) {
        CAPTURE(p);
        CHECK_THROWS_AS(pinproof::write_file_atomically(p.string(), "x"), input_error);
    }
    CHECK(fs::is_fifo(fifo));
    CHECK(entries(dir.path) == 3);
}

TEST_CASE("output set - an empty name and two outputs naming one file are refused")
{
    pinproof::testing::temp_dir dir("output-file");
    output_set empty;
    empty.add("--json", "", "x");
    CHECK_THROWS_AS(empty.commit(), input_error);
    output_set twice;
    twice.add("--csv", (dir.path / "out").string(), "a");
    twice.add("--json", (dir.path / "." / "out").string(), "b");
    CHECK_THROWS_AS(twice.commit(), input_error);
    CHECK(entries(dir.path) == 0);
}

TEST_CASE("output set - a missing folder fails the whole set and leaves the first target as it was")
{
    pinproof::testing::temp_dir dir("output-file");
    const std::string first = dir.write("a.csv", "previous run");
    output_set s;
    s.add("--csv", first, "this run");
    s.add("--json", (dir.path / "missing" / "b.json").string(), "this run");
    CHECK_THROWS(s.commit());
    CHECK(contents(first) == "previous run");
    CHECK(entries(dir.path) == 1);
}

TEST_CASE("input file - a directory and a device and a missing file are named as such")
{
    pinproof::testing::temp_dir dir("input-file");
    const auto message = [](const std::string& path) {
        try {
            pinproof::read_input_file(path, "project file");
        } catch (const input_error& e) {
            return e.problems().front().message;
        }
        return std::string("accepted");
    };
    CHECK(message(dir.path.string()).find("found a directory") != std::string::npos);
    CHECK(message("/dev/zero").find("found a character device") != std::string::npos);
    CHECK(message((dir.path / "none.json").string()).find("No such file") != std::string::npos);
}

TEST_CASE("input file - a file larger than 512 MiB is refused before it is read")
{
    pinproof::testing::temp_dir dir("input-file");
    const fs::path big = dir.path / "big.json";
    { std::ofstream(big) << "{}"; }
    fs::resize_file(big, pinproof::max_input_bytes + 1);  // sparse: no disk space used
    try {
        pinproof::read_input_file(big.string(), "project file");
        FAIL("accepted");
    } catch (const input_error& e) {
        CHECK(e.problems().front().message.find("at most 512 MiB") != std::string::npos);
    }
}

TEST_CASE("output set [POSIX] - content held in a scratch file is written as head and body and tail and no file is left")
{
    pinproof::testing::temp_dir d("output-file");
    const std::string target = (d.path / "big.csv").string();
    auto body = std::make_shared<pinproof::scratch_file>(target);
    std::string expected;
    for (int i = 0; i < 200000; ++i) {  // a few megabytes: more than the scratch file's buffer
        const std::string line = std::to_string(i) + ",row\n";
        body->append(line);
        expected += line;
    }
    CHECK(body->size() == expected.size());
    output_set s;
    s.add("--out", target, "head\n", body, "tail\n");
    s.commit();
    CHECK(contents(d.path / "big.csv") == "head\n" + expected + "tail\n");
    std::ostringstream copy;
    body->copy_to(copy);
    CHECK(copy.str() == expected);
    body->clear();
    CHECK(body->size() == 0);
    // Only the target: the scratch file has no name, the temporary was renamed.
    CHECK(entries(d.path) == 1);
}

TEST_CASE("input file - read part by part with the size and the identity of read_input_file")
{
    pinproof::testing::temp_dir d("output-file");
    const std::string path = (d.path / "in.csv").string();
    std::ofstream(path) << "0123456789";
    pinproof::input_file_stream in(path, "schedule");
    CHECK(in.size() == 10);
    std::string text;
    CHECK(in.read_more(text, 4) == 4);
    CHECK(in.read_more(text, 100) == 6);
    CHECK(in.read_more(text, 100) == 0);
    CHECK(text == "0123456789");
    CHECK(in.bytes_read() == 10);
    output_set s;
    s.add("--out", path, "x");
    CHECK_THROWS_AS(s.check(), input_error);
}
