#include "pinproof/core/output_file.hpp"

#include <cerrno>
#include <cstdio>
#include <cstring>
#include <fstream>
#include <random>

#include "pinproof/core/errors.hpp"

namespace pinproof {

void write_file_atomically(const std::string& path, const std::string& content)
{
    std::random_device rd;
    const std::string tmp = path + ".tmp-" + std::to_string(rd() % 1000000);
    {
        std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
        if (!out) throw error("cannot write " + path + ": " + std::strerror(errno));
        out << content;
        out.flush();
        if (!out) {
            out.close();
            std::remove(tmp.c_str());
            throw error("cannot write " + path + ": " + std::strerror(errno));
        }
    }
    if (std::rename(tmp.c_str(), path.c_str()) != 0) {
        const std::string why = std::strerror(errno);
        std::remove(tmp.c_str());
        throw error("cannot write " + path + ": " + why);
    }
}

}  // namespace pinproof
