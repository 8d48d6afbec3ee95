// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <unistd.h>

namespace hierloom::test {

/// A fresh folder under the system's temporary folder, removed afterwards.
class TempDir {
public:
    TempDir()
    {
        path_ = std::filesystem::temp_directory_path() /
                ("hierloom-test-" + std::to_string(::getpid()) + "-" + std::to_string(counter()++));
        std::filesystem::remove_all(path_);
        std::filesystem::create_directories(path_);
    }
    ~TempDir() { std::filesystem::remove_all(path_); }
    std::string file(const std::string& name) const { return (path_ / name).string(); }
    std::string write(const std::string& name, const std::string& text) const
    {
        std::ofstream(file(name), std::ios::binary) << text;
        return file(name);
    }

private:
    static int& counter()
    {
        static int c = 0;
        return c;
    }
    std::filesystem::path path_;
};

/// A small colony of four animals in two groups that the import tests build on:
/// SIRE moves from east to west on 2020-01-01, D2 dies on 2023-02-01.
inline const char* const kBaseAnimals = "id,name,sex,birth_date,mother,father,entry_date,entry_type,exit_date,exit_type\n"
                                        "MA,Matriarch,F,2008-04-01,,,2010-01-01,founder,,\n"
                                        "SIRE,Sire,M,2007-05-01,,,2010-01-01,founder,,\n"
                                        "D1,Daughter,F,2014-05-02,MA,SIRE,,born,,\n"
                                        "D2,Second,F,2016-04-20,MA,,,born,2023-02-01,died\n";
inline const char* const kBaseResidences = "animal,group,from,to\n"
                                           "MA,east,2010-01-01,\n"
                                           "SIRE,east,2010-01-01,2019-12-31\n"
                                           "SIRE,west,2020-01-01,\n"
                                           "D1,east,2014-05-02,\n"
                                           "D2,east,2016-04-20,\n";

inline std::string fileBytes(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

} // namespace hierloom::test
