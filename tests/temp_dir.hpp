// A fresh directory under the system temporary directory for one test,
// removed with everything in it when the test ends.
#pragma once

#include <filesystem>
#include <fstream>
#include <random>
#include <string>
#include <system_error>

namespace pinproof::testing {

struct temp_dir {
    std::filesystem::path path;
    explicit temp_dir(const std::string& purpose = "test")
    {
        std::random_device rd;
        path = std::filesystem::temp_directory_path() /
               ("pinproof-" + purpose + "-" + std::to_string(rd()) + std::to_string(rd()));
        std::filesystem::create_directories(path);
    }
    ~temp_dir()
    {
        std::error_code ec;
        std::filesystem::remove_all(path, ec);
    }
    temp_dir(const temp_dir&) = delete;
    temp_dir& operator=(const temp_dir&) = delete;
    // Writes `text` to the file `name` in the directory and returns its path.
    std::string write(const std::string& name, const std::string& text) const
    {
        std::ofstream(path / name, std::ios::binary) << text;
        return (path / name).string();
    }
};

}  // namespace pinproof::testing
